import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/select';
import { TextInput } from '@/components/ui/text-input';
import type { ConditionsDraft, ConditionsErrors } from '../../lib/reading-conditions';

interface ReadingConditionsFieldsProps {
  draft: ConditionsDraft;
  errors: ConditionsErrors;
  onChange: (draft: ConditionsDraft) => void;
  /** Shown when saved readings were taken with other conditions than the ones typed now. */
  onResave?: () => void;
  disabled: boolean;
}

/** Winding temperature and cable run, folded away: most readings need neither. */
export function ReadingConditionsFields({ draft, errors, onChange, onResave, disabled }: ReadingConditionsFieldsProps) {
  const set = (patch: Partial<ConditionsDraft>) => onChange({ ...draft, ...patch });
  const open = draft.temperature !== '' || draft.awg !== '' || draft.length !== '';
  return (
    <details open={open} className="rounded-lg border border-surface-line bg-surface-raised p-4">
      <summary className="flex min-h-touch cursor-pointer items-center text-lg font-semibold text-ink">Temperature / cable</summary>
      <div className="mt-3 grid gap-4 sm:grid-cols-2">
        <Field label="Winding temperature (°C)" hint="If the press was running: a warm winding reads higher." error={errors.temperature}>
          <TextInput inputMode="decimal" value={draft.temperature} disabled={disabled} onChange={(e) => set({ temperature: e.target.value })} />
        </Field>
        <Field label="Cable conductor size (AWG)" error={errors.awg}>
          <TextInput inputMode="numeric" value={draft.awg} disabled={disabled} onChange={(e) => set({ awg: e.target.value })} />
        </Field>
        <Field label="Cable length" error={errors.length}>
          <TextInput inputMode="decimal" value={draft.length} disabled={disabled} onChange={(e) => set({ length: e.target.value })} />
        </Field>
        <div className="grid grid-cols-2 gap-3">
          <Field label="Unit">
            <Select value={draft.lengthUnit} disabled={disabled} onChange={(e) => set({ lengthUnit: e.target.value as ConditionsDraft['lengthUnit'] })}>
              <option value="ft">ft</option>
              <option value="m">m</option>
            </Select>
          </Field>
          <Field label="Length is">
            <Select value={draft.lengthIs} disabled={disabled} onChange={(e) => set({ lengthIs: e.target.value as ConditionsDraft['lengthIs'] })}>
              <option value="one_way">one way</option>
              <option value="loop">the whole loop</option>
            </Select>
          </Field>
        </div>
      </div>
      <p className="mt-3 text-base text-ink-muted">
        The cable is subtracted only from readings taken at the control end. Every reading of this step is saved with these values.
      </p>
      {onResave && (
        <Button variant="secondary" className="mt-3" disabled={disabled} onClick={onResave}>
          Save the readings again with these values
        </Button>
      )}
    </details>
  );
}
