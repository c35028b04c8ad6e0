import { get, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { BandSetValues } from '@shared/schemas/band-set';
import { NumberWithUnit } from '@/components/ui/number-with-unit';

interface Props {
  name: 'excitation' | 'statorOutputMagnitude';
  title: string;
  register: UseFormRegister<BandSetValues>;
  errors: FieldErrors<BandSetValues>;
}

/** An AC-voltage range in volts RMS, with the near-edge margin that widens it on both sides. */
export function VoltageRangeFields({ name, title, register, errors }: Props) {
  const num = { valueAsNumber: true } as const;
  const error = (key: string) => (get(errors, `${name}.${key}`) as { message?: string } | undefined)?.message;
  return (
    <fieldset className="space-y-4 rounded-lg border border-surface-line p-4">
      <legend className="px-1 text-xl font-semibold text-ink">{title}</legend>
      <div className="grid gap-4 sm:grid-cols-3">
        <NumberWithUnit label="Lowest" unit="V RMS" error={error('min')} registration={register(`${name}.min`, num)} />
        <NumberWithUnit label="Highest" unit="V RMS" error={error('max')} registration={register(`${name}.max`, num)} />
        <NumberWithUnit label="Near-edge margin" unit="%" error={error('nearEdgePercent')} registration={register(`${name}.nearEdgePercent`, num)} />
      </div>
    </fieldset>
  );
}
