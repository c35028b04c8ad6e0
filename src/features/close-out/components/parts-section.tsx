import { useFieldArray } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Section } from '@/components/ui/section';
import { TextInput } from '@/components/ui/text-input';
import { useCloseOutForm } from '../hooks/use-close-out-form';
import { emptyAsAbsent, newPartRow } from '../utils/close-out-values';

/** Parts fitted on this visit, with the serials that came out and went in. */
export function PartsSection() {
  const { control, register, errors } = useCloseOutForm();
  const { fields, append, remove } = useFieldArray({ control, name: 'parts', keyName: 'rowKey' });

  return (
    <Section variant="form" title="Parts used">
      {fields.length === 0 && <p className="text-lg text-ink-muted">No parts listed. Add each part you fitted, one row per part number.</p>}
      {fields.map((row, index) => {
        const rowErrors = errors.parts?.[index];
        return (
          <fieldset key={row.rowKey} className="space-y-4 rounded-lg border-2 border-surface-line bg-surface-raised p-4">
            <legend className="px-1 text-lg font-semibold text-ink">Part {index + 1}</legend>
            <div className="grid gap-4 sm:grid-cols-[2fr_3fr_1fr]">
              <Field label="Part number" error={rowErrors?.partNumber?.message}>
                <TextInput autoCapitalize="characters" spellCheck={false} {...register(`parts.${index}.partNumber`)} />
              </Field>
              <Field label="Description" error={rowErrors?.description?.message}>
                <TextInput {...register(`parts.${index}.description`)} />
              </Field>
              <Field label="Quantity" error={rowErrors?.quantity?.message}>
                <TextInput inputMode="numeric" {...register(`parts.${index}.quantity`)} />
              </Field>
            </div>
            <div className="grid gap-4 sm:grid-cols-2">
              <Field label="Serial removed (optional)" error={rowErrors?.serialRemoved?.message}>
                <TextInput spellCheck={false} {...register(`parts.${index}.serialRemoved`, { setValueAs: emptyAsAbsent })} />
              </Field>
              <Field label="Serial fitted (optional)" error={rowErrors?.serialFitted?.message}>
                <TextInput spellCheck={false} {...register(`parts.${index}.serialFitted`, { setValueAs: emptyAsAbsent })} />
              </Field>
            </div>
            <Button variant="secondary" onClick={() => remove(index)}>
              Remove part {index + 1}
            </Button>
          </fieldset>
        );
      })}
      <Button variant="secondary" size="lg" onClick={() => append(newPartRow())}>
        <span aria-hidden="true">+</span> Add a part
      </Button>
    </Section>
  );
}
