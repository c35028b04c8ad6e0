/** A short list of search results (customers or sites) to tap. */
export function PickList<T extends { id: number; name: string }>({ items, label, onPick, describe }: { items: T[]; label: string; onPick: (item: T) => void; describe?: (item: T) => string | null }) {
  return (
    <ul aria-label={label} className="space-y-2">
      {items.map((item) => (
        <li key={item.id}>
          <button
            type="button"
            onClick={() => onPick(item)}
            className="block min-h-touch w-full rounded-lg border-2 border-surface-line bg-surface-raised px-4 py-3 text-left text-lg font-semibold text-ink hover:border-accent focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent"
          >
            {item.name}
            {describe?.(item) && <span className="block text-base font-normal text-ink-muted">{describe(item)}</span>}
          </button>
        </li>
      ))}
    </ul>
  );
}
