import { zodResolver } from '@hookform/resolvers/zod';
import { useFieldArray, useForm, type FieldPath } from 'react-hook-form';
import { firmwareRulesDraftSchema, type FirmwareRuleSetRecord, type FirmwareRulesDraftInput } from '@shared/schemas/admin-reference';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { errorMessage, isApiError } from '@/lib/api-error';
import { firmwareRulesApi } from '@/api/firmware-rules';
import { FORM_MESSAGES } from '../lib/form-messages';
import { FirmwareRuleRow } from './firmware-rule-row';

const HEADERS = ['Key', 'Press control from', 'Press control before', 'Monitor module from', 'Monitor module before', 'Pairing', 'Note', 'Invented'];

/** The rules of one version as an editable table; version ranges are half-open (from ≤ v < before). */
export function FirmwareRuleTable({ record, editable }: { record: FirmwareRuleSetRecord; editable: boolean }) {
  const save = firmwareRulesApi.useSaveDraft();
  const { register, control, handleSubmit, setError, reset, formState: { errors, isDirty } } = useForm<FirmwareRulesDraftInput>({
    resolver: zodResolver(firmwareRulesDraftSchema, FORM_MESSAGES),
    defaultValues: { rules: record.rules },
  });
  const { fields, append, remove } = useFieldArray({ control, name: 'rules' });

  const onSubmit = handleSubmit(async ({ rules }) => {
    try {
      const saved = await save.mutateAsync({ id: record.id, body: { rules } });
      reset({ rules: saved.rules });
    } catch (error) {
      if (!isApiError(error)) return;
      for (const [path, message] of Object.entries(error.fields)) setError(path as FieldPath<FirmwareRulesDraftInput>, { message });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label={`Firmware rules version ${record.version}`}>
      {save.isError && (
        <Banner tone="error" role="alert" title="The rules were not saved">
          {errorMessage(save.error)}
        </Banner>
      )}
      {save.isSuccess && !isDirty && <Banner role="status" title="Draft saved">Publish it when the rules are checked.</Banner>}
      <p className="text-base text-ink-muted">A range runs from its “from” version up to but not including its “before” version; leave a box empty for no limit.</p>
      <div className="overflow-x-auto">
        <fieldset disabled={!editable}>
          <table className="min-w-[64rem] text-left">
            <thead>
              <tr className="text-base text-ink-muted">
                {HEADERS.map((h) => (
                  <th key={h} scope="col" className="p-1.5 font-semibold">
                    {h}
                  </th>
                ))}
                {editable && <th scope="col" className="p-1.5"><span className="sr-only">Remove</span></th>}
              </tr>
            </thead>
            <tbody>
              {fields.map((field, index) => (
                <FirmwareRuleRow key={field.id} index={index} register={register} errors={errors} editable={editable} onRemove={() => remove(index)} />
              ))}
            </tbody>
          </table>
        </fieldset>
      </div>
      {editable && (
        <div className="flex flex-wrap gap-3">
          <Button variant="secondary" onClick={() => append({ key: '', pressControl: {}, monitorModule: {}, compatible: true, note: '', invented: false })}>
            Add a rule
          </Button>
          <Button type="submit" disabled={save.isPending}>
            {save.isPending ? 'Saving…' : 'Save draft'}
          </Button>
        </div>
      )}
    </form>
  );
}
