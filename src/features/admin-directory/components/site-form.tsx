import { useQuery } from '@tanstack/react-query';
import { siteInputSchema, type Site } from '@shared/schemas/site';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { directoryListOptions } from '@/api/directory';
import { useRecordForm } from '../hooks/use-record-form';
import { RecordForm } from './record-form';
import { Select } from '@/components/ui/select';

const NAMES = ['customerId', 'name', 'address', 'city'] as const;

export function SiteForm({ site, onDone }: { site: Site | null; onDone: () => void }) {
  const { save, register, errors, onSubmit } = useRecordForm({ resource: 'sites', schema: siteInputSchema, record: site, names: NAMES, onDone });
  const customers = useQuery(directoryListOptions('customers', { q: '', page: 1, pageSize: 100 }));
  return (
    <RecordForm title={site ? `Edit ${site.name}` : 'Add a site'} onSubmit={onSubmit} onCancel={onDone} busy={save.isPending} error={save.error}>
      <Field label="Customer" error={errors.customerId?.message} hint={customers.isPending ? 'Loading customers…' : undefined}>
        <Select {...register('customerId')} options={customers.data?.items.map((c) => ({ value: String(c.id), label: c.name }))}>
          <option value="">Pick the customer</option>
        </Select>
      </Field>
      <Field label="Site name" error={errors.name?.message}>
        <TextInput {...register('name')} />
      </Field>
      <div className="grid gap-4 md:grid-cols-2">
        <Field label="Address" error={errors.address?.message}>
          <TextInput autoComplete="street-address" {...register('address')} />
        </Field>
        <Field label="City" error={errors.city?.message}>
          <TextInput {...register('city')} />
        </Field>
      </div>
    </RecordForm>
  );
}
