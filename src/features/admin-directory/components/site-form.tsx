import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { siteInputSchema, type Site, type SiteInput } from '@shared/schemas/site';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { directoryListOptions, useSaveRecord } from '@/api/directory';
import { RecordForm } from './record-form';
import { Select } from '@/components/ui/select';
import { applyServerErrors } from '@/lib/apply-server-errors';

type Fields = z.input<typeof siteInputSchema>;
const NAMES = ['customerId', 'name', 'address', 'city'] as const;

export function SiteForm({ site, onDone }: { site: Site | null; onDone: () => void }) {
  const save = useSaveRecord('sites');
  const customers = useQuery(directoryListOptions('customers', { q: '', page: 1, pageSize: 100 }));
  const { register, handleSubmit, setError, formState: { errors } } = useForm<Fields, unknown, SiteInput>({
    resolver: zodResolver(siteInputSchema),
    defaultValues: { customerId: site?.customerId ?? '', name: site?.name ?? '', address: site?.address ?? '', city: site?.city ?? '' },
  });
  const onSubmit = handleSubmit(async (values) => {
    try {
      await save.mutateAsync({ id: site?.id ?? null, values });
      onDone();
    } catch (error) {
      applyServerErrors({ setError }, error, NAMES);
    }
  });
  return (
    <RecordForm title={site ? `Edit ${site.name}` : 'Add a site'} onSubmit={() => void onSubmit()} onCancel={onDone} busy={save.isPending} error={save.error}>
      <Field label="Customer" error={errors.customerId?.message} hint={customers.isPending ? 'Loading customers…' : undefined}>
        <Select {...register('customerId')}>
          <option value="">Pick the customer</option>
          {customers.data?.items.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
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
