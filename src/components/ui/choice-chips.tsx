import { chipVariants } from './control-variants';

interface ChoiceChipsProps<V extends string> {
  legend: string;
  options: ReadonlyArray<{ value: V; label: string }>;
  /** The values switched on, in any order. */
  selected: readonly string[];
  onToggle: (value: V, on: boolean) => void;
}

/** Any number of choices among a few, as a row of chips (checkboxes): a filter, not a form answer. */
export function ChoiceChips<V extends string>({ legend, options, selected, onToggle }: ChoiceChipsProps<V>) {
  return (
    <fieldset>
      <legend className="mb-2 text-lg font-semibold text-ink">{legend}</legend>
      <div className="flex flex-wrap gap-3">
        {options.map((option) => (
          <label key={option.value} className={chipVariants()}>
            <input type="checkbox" className="h-6 w-6 accent-accent" checked={selected.includes(option.value)} onChange={(e) => onToggle(option.value, e.target.checked)} />
            {option.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
