import { useId } from 'react';
import { chipVariants } from './control-variants';
import { FieldError } from './field-error';

interface RadioChipsProps<V extends string> {
  legend: string;
  options: ReadonlyArray<{ value: V; label: string }>;
  /** The chosen value; '' while nothing is chosen. */
  value: string;
  onChange: (value: V) => void;
  disabled?: boolean;
  error?: string;
}

/** One short answer among two or three (yes / no), as a row of large chips: compact where a step asks many. */
export function RadioChips<V extends string>({ legend, options, value, onChange, disabled, error }: RadioChipsProps<V>) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <fieldset className="space-y-2" aria-invalid={error ? true : undefined} aria-describedby={error ? errorId : undefined}>
      <legend className="text-lg font-semibold text-ink">{legend}</legend>
      <div className="flex flex-wrap gap-3">
        {options.map((option) => (
          <label key={option.value} className={chipVariants()}>
            <input type="radio" name={id} className="h-6 w-6 accent-accent" checked={value === option.value} disabled={disabled} onChange={() => onChange(option.value)} />
            {option.label}
          </label>
        ))}
      </div>
      <FieldError id={errorId} message={error} />
    </fieldset>
  );
}
