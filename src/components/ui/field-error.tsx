/** Error text for a control or a group: read out at once (role="alert"), with a mark besides colour. */
export function FieldError({ id, message }: { id?: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} role="alert" className="flex items-start gap-2 text-base font-medium text-verdict-out_of_band">
      <span aria-hidden="true" className="font-bold">
        ✕
      </span>
      {message}
    </p>
  );
}
