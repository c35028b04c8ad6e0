import { useId } from 'react';
import type { BandSetRecord, VisitDetail } from '@shared/schemas/visit-detail';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/select';

interface GenerationPickerProps {
  suggestion: VisitDetail['generationSuggestion'];
  bandSets: BandSetRecord[];
  value: string;
  onChange: (generation: string) => void;
  disabled: boolean;
}

/** The sensor generation when the nameplate could not say: the engine's suggestion, the person's choice. */
export function GenerationPicker({ suggestion, bandSets, value, onChange, disabled }: GenerationPickerProps) {
  const id = useId();
  const best = suggestion?.best ?? null;
  return (
    <section aria-labelledby={`${id}-heading`} className="space-y-3 rounded-lg border-2 border-accent bg-accent-soft p-4">
      <h3 id={`${id}-heading`} className="text-xl font-semibold text-ink">
        Sensor generation not known yet
      </h3>
      {suggestion ? (
        <p className="text-lg text-ink">
          {best ? (
            <>
              Suggested: <strong>{best.label}</strong> (confidence {(best.confidence * 100).toFixed(0)} %).{' '}
            </>
          ) : null}
          {suggestion.reason}
        </p>
      ) : (
        <p className="text-lg text-ink">Enter the readings: a generation is suggested from them. Or choose it if you know it.</p>
      )}
      <Field label="Judge the readings as">
        <Select fit="medium" value={value} disabled={disabled} onChange={(e) => onChange(e.target.value)}>
          <option value="">Choose a sensor generation…</option>
          {bandSets.map((b) => (
            <option key={b.generation} value={b.generation}>
              {b.label}
              {best?.generation === b.generation ? ' (suggested)' : ''}
            </option>
          ))}
        </Select>
      </Field>
      <p className="text-base text-ink-muted">Your choice is sent with this step; check it against the sensor before relying on it.</p>
    </section>
  );
}
