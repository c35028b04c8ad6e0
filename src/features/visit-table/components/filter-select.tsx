import { useId } from 'react';

interface FilterSelectProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  options: Array<{ value: string; label: string }>;
  /** What "no choice" reads as, e.g. "All customers". */
  anyLabel: string;
  disabled?: boolean;
  hint?: string;
}

export function FilterSelect({ label, value, onChange, options, anyLabel, disabled, hint }: FilterSelectProps) {
  const id = useId();
  return (
    <div className="space-y-1.5">
      <label htmlFor={id} className="block text-lg font-semibold text-ink">
        {label}
      </label>
      <select
        id={id}
        value={value}
        disabled={disabled}
        onChange={(e) => onChange(e.target.value)}
        aria-describedby={hint ? `${id}-hint` : undefined}
        className="block min-h-touch w-full rounded-lg border-2 border-surface-edge bg-surface-raised px-3 text-lg text-ink focus:border-accent focus:outline-none focus:ring-[3px] focus:ring-accent/40 disabled:opacity-60"
      >
        <option value="">{anyLabel}</option>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {hint && (
        <p id={`${id}-hint`} className="text-base text-ink-muted">
          {hint}
        </p>
      )}
    </div>
  );
}
