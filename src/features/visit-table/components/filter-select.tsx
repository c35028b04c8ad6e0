import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/select';

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
  return (
    <Field label={label} hint={hint}>
      <Select value={value} disabled={disabled} onChange={(e) => onChange(e.target.value)} options={options} className="disabled:opacity-60">
        <option value="">{anyLabel}</option>
      </Select>
    </Field>
  );
}
