import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useForm, useWatch } from 'react-hook-form';
import { CAPACITY_UNIT_NAMES } from '@shared/format/capacity';
import type { z } from 'zod';
import { pressInputSchema, type Press, type PressInput } from '@shared/schemas/press';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { directoryListOptions, useSaveRecord } from '@/api/directory';
import { RecordForm } from './record-form';
import { Select } from '@/components/ui/select';
import { applyServerErrors } from '@/lib/apply-server-errors';

type Fields = z.input<typeof pressInputSchema>;
const NAMES = ['siteId', 'assetTag', 'model', 'tonnage', 'controlModel', 'sensorGeneration', 'controlFirmware', 'monitorFirmware', 'notes'] as const;

export function PressForm({ press, onDone }: { press: Press | null; onDone: () => void }) {
  const save = useSaveRecord('presses');
  const sites = useQuery(directoryListOptions('sites', { q: '', page: 1, pageSize: 100 }));
  const { register, handleSubmit, setError, control, formState: { errors } } = useForm<Fields, unknown, PressInput>({
    resolver: zodResolver(pressInputSchema),
    defaultValues: {
      siteId: press?.siteId ?? '',
      assetTag: press?.assetTag ?? '',
      model: press?.model ?? '',
      tonnage: press?.tonnage ?? '',
      controlModel: press?.controlModel ?? '',
      sensorGeneration: press?.sensorGeneration ?? '',
      controlFirmware: press?.controlFirmware ?? '',
      monitorFirmware: press?.monitorFirmware ?? '',
      notes: press?.notes ?? '',
    },
  });
  // The capacity is typed in the unit of the chosen site's customer.
  const siteId = useWatch({ control, name: 'siteId' });
  const unit = sites.data?.items.find((s) => String(s.id) === String(siteId))?.capacityUnit ?? press?.capacityUnit;
  const onSubmit = handleSubmit(async (values) => {
    try {
      await save.mutateAsync({ id: press?.id ?? null, values });
      onDone();
    } catch (error) {
      applyServerErrors({ setError }, error, NAMES);
    }
  });
  const text = (name: (typeof NAMES)[number], label: string, hint?: string) => (
    <Field label={label} hint={hint} error={errors[name]?.message}>
      <TextInput {...register(name)} />
    </Field>
  );
  return (
    <RecordForm title={press ? `Edit press ${press.assetTag}` : 'Add a press'} onSubmit={() => void onSubmit()} onCancel={onDone} busy={save.isPending} error={save.error}>
      <Field label="Site" error={errors.siteId?.message} hint={sites.isPending ? 'Loading sites…' : undefined}>
        <Select {...register('siteId')}>
          <option value="">Pick the site</option>
          {sites.data?.items.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
              {s.customerName ? ` — ${s.customerName}` : ''}
            </option>
          ))}
        </Select>
      </Field>
      <div className="grid gap-4 md:grid-cols-3">
        {text('assetTag', 'Asset tag', 'As painted or labelled on the press')}
        {text('model', 'Press model')}
        <Field label={unit ? `Capacity (${CAPACITY_UNIT_NAMES[unit]})` : 'Capacity'} hint={unit ? 'As rated on the nameplate' : 'Pick the site first: the unit is the customer’s'} error={errors.tonnage?.message}>
          <TextInput inputMode="numeric" {...register('tonnage')} />
        </Field>
        {text('controlModel', 'Control model')}
        {text('sensorGeneration', 'Sensor generation', 'The band-set generation key, e.g. demo-gen-1')}
        {text('controlFirmware', 'Press control firmware', 'Dotted version, e.g. 2.10')}
        {text('monitorFirmware', 'Monitor module firmware', 'Dotted version, e.g. 3.1.4')}
      </div>
      {text('notes', 'Notes')}
    </RecordForm>
  );
}
