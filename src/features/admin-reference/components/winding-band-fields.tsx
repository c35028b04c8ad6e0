import { get, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { BandSetValues } from '@shared/schemas/band-set';
import { CIRCUIT_LEADS, type Circuit } from '@shared/schemas/reading';
import { NumberWithUnit } from '@/components/ui/number-with-unit';

export const CIRCUIT_NAMES: Record<Circuit, string> = { rotor: 'Rotor', stator_1: 'Stator 1', stator_2: 'Stator 2' };

interface Props {
  circuit: Circuit;
  register: UseFormRegister<BandSetValues>;
  errors: FieldErrors<BandSetValues>;
}

/** The resistance band of one winding, at the band set's reference temperature. */
export function WindingBandFields({ circuit, register, errors }: Props) {
  const path = `windings.${circuit}` as const;
  const num = { valueAsNumber: true } as const;
  const error = (key: string) => (get(errors, `${path}.${key}`) as { message?: string } | undefined)?.message;
  return (
    <fieldset className="space-y-4 rounded-lg border border-surface-line p-4">
      <legend className="px-1 text-xl font-semibold text-ink">
        {CIRCUIT_NAMES[circuit]} winding ({CIRCUIT_LEADS[circuit]})
      </legend>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <NumberWithUnit label="Nominal" unit="Ω" error={error('nominal')} registration={register(`${path}.nominal`, num)} />
        <NumberWithUnit label="In band within" unit="± %" error={error('inBandPercent')} registration={register(`${path}.inBandPercent`, num)} />
        <NumberWithUnit label="Near edge within" unit="± %" hint="Wider than in band" error={error('nearEdgePercent')} registration={register(`${path}.nearEdgePercent`, num)} />
        <NumberWithUnit label="Short below" unit="Ω" error={error('shortBelow')} registration={register(`${path}.shortBelow`, num)} />
        <NumberWithUnit label="Open above" unit="Ω" error={error('openAbove')} registration={register(`${path}.openAbove`, num)} />
      </div>
    </fieldset>
  );
}
