import { useId, useState } from 'react';
import { judgeEntry, type EntryJudgement } from '@shared/domain/judge-entry';
import { bandSetValuesSchema } from '@shared/schemas/band-set';
import { CIRCUIT_LEADS, type Circuit } from '@shared/schemas/reading';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/select';
import { TextInput } from '@/components/ui/text-input';
import { VerdictMark } from '@/components/ui/verdict-mark';

type Target = 'rotor' | 'stator_1' | 'stator_2' | 'excitation' | 'stator_pair';

const TARGETS: { value: Target; label: string }[] = [
  { value: 'rotor', label: `Rotor resistance (${CIRCUIT_LEADS.rotor})` },
  { value: 'stator_1', label: `Stator 1 resistance (${CIRCUIT_LEADS.stator_1})` },
  { value: 'stator_2', label: `Stator 2 resistance (${CIRCUIT_LEADS.stator_2})` },
  { value: 'excitation', label: `Excitation voltage (${CIRCUIT_LEADS.rotor})` },
  { value: 'stator_pair', label: 'Stator output pair (S1–S3 and S2–S4)' },
];

function judge(bands: unknown, target: Target, entered: string, second: string, temperature: string): EntryJudgement | { status: 'invalid_bands' } | null {
  if (entered.trim() === '') return null;
  const parsed = bandSetValuesSchema.safeParse(bands);
  if (!parsed.success) return { status: 'invalid_bands' };
  const t = temperature.trim() === '' ? undefined : Number(temperature);
  if (target === 'rotor' || target === 'stator_1' || target === 'stator_2') {
    const windingTemperatureC = t !== undefined && Number.isFinite(t) ? t : undefined;
    return judgeEntry({ quantity: 'resistance', circuit: target satisfies Circuit, position: 'sensor_end', entered, windingTemperatureC }, parsed.data);
  }
  if (target === 'excitation') return judgeEntry({ quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', entered }, parsed.data);
  return judgeEntry({ quantity: 'ac_voltage', circuit: 'stator_1', position: 'control_end', entered }, parsed.data, { otherStatorEntered: second });
}

/**
 * Type a reading and see how the bands being edited would judge it, with the same engine the
 * technician's tablet and the server use. Nothing is saved.
 */
export function JudgementPreview({ bands }: { bands: unknown }) {
  const targetId = useId();
  const [target, setTarget] = useState<Target>('rotor');
  const [entered, setEntered] = useState('');
  const [second, setSecond] = useState('');
  const [temperature, setTemperature] = useState('');
  const result = judge(bands, target, entered, second, temperature);
  const resistance = target === 'rotor' || target === 'stator_1' || target === 'stator_2';

  return (
    <section aria-labelledby={`${targetId}-title`} className="space-y-4 rounded-lg border-2 border-accent bg-accent-soft p-4">
      <h2 id={`${targetId}-title`} className="text-xl font-semibold text-ink">
        Preview a judgement
      </h2>
      <p className="text-base text-ink-muted">Try a value against these bands before publishing. Nothing is saved.</p>
      <Field label="Reading">
        <Select id={targetId} value={target} onChange={(e) => setTarget(e.target.value as Target)} options={TARGETS} />
      </Field>
      <Field label={target === 'stator_pair' ? 'S1–S3 as the meter shows it' : 'Value as the meter shows it'} hint={resistance ? 'For example 98.5, 0.1 kΩ or OL' : 'For example 4.2 or 4200 mV'}>
        <TextInput value={entered} onChange={(e) => setEntered(e.target.value)} autoComplete="off" spellCheck={false} />
      </Field>
      {target === 'stator_pair' && (
        <Field label="S2–S4 as the meter shows it">
          <TextInput value={second} onChange={(e) => setSecond(e.target.value)} autoComplete="off" spellCheck={false} />
        </Field>
      )}
      {resistance && (
        <Field label="Winding temperature (°C)" hint="Optional: corrected to the band’s reference temperature">
          <TextInput type="number" inputMode="decimal" step="any" value={temperature} onChange={(e) => setTemperature(e.target.value)} className="max-w-[12rem]" />
        </Field>
      )}
      <div aria-live="polite" className="min-h-touch">
        <PreviewResult result={result} />
      </div>
    </section>
  );
}

function PreviewResult({ result }: { result: ReturnType<typeof judge> }) {
  if (!result) return null;
  if (result.status === 'invalid_bands') return <p className="text-lg text-ink">Fix the highlighted band fields first; the preview needs a complete band set.</p>;
  if (result.status === 'error') return <p className="text-lg font-medium text-verdict-out_of_band">{result.error}</p>;
  if (result.status === 'awaiting') return <p className="text-lg text-ink">{result.reason}</p>;
  return (
    <div className="space-y-2">
      <VerdictMark verdict={result.verdict} />
      <p className="text-lg text-ink">{result.reason}</p>
      {result.notes.length > 0 && (
        <ul className="list-disc space-y-1 pl-6 text-base text-ink-muted">
          {result.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
