import { useQuery } from '@tanstack/react-query';
import { useWatch } from 'react-hook-form';
import { CAPACITY_UNIT_NAMES } from '@shared/format/capacity';
import { pressInputSchema, type Press } from '@shared/schemas/press';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { directoryListOptions } from '@/api/directory';
import { useRecordForm } from '../hooks/use-record-form';
import { RecordForm } from './record-form';
import { Select } from '@/components/ui/select';

const NAMES = ['siteId', 'assetTag', 'model', 'tonnage', 'controlModel', 'sensorGeneration', 'controlFirmware', 'monitorFirmware', 'notes'] as const;

export function PressForm({ press, onDone }: { press: Press | null; onDone: () => void }) {
  const { save, register, control, errors, onSubmit } = useRecordForm({ resource: 'presses', schema: pressInputSchema, record: press, names: NAMES, onDone });
  const sites = useQuery(directoryListOptions('sites', { q: '', page: 1, pageSize: 100 }));
  // The capacity is typed in the unit of the chosen site's customer.
  const siteId = useWatch({ control, name: 'siteId' });
  const unit = sites.data?.items.find((s) => String(s.id) === String(siteId))?.capacityUnit ?? press?.capacityUnit;
  const text = (name: (typeof NAMES)[number], label: string, hint?: string) => (
    <Field label={label} hint={hint} error={errors[name]?.message}>
      <TextInput {...register(name)} />
    </Field>
  );
  return (
    <RecordForm title={press ? `Edit press ${press.assetTag}` : 'Add a press'} onSubmit={onSubmit} onCancel={onDone} busy={save.isPending} error={save.error}>
      <Field label="Site" error={errors.siteId?.message} hint={sites.isPending ? 'Loading sites…' : undefined}>
        <Select {...register('siteId')} options={sites.data?.items.map((s) => ({ value: String(s.id), label: s.customerName ? `${s.name} — ${s.customerName}` : s.name }))}>
          <option value="">Pick the site</option>
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
