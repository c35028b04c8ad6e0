import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { CAPACITY_UNIT_LABELS, CAPACITY_UNITS } from '@shared/format/capacity';
import { customerInputSchema, type Customer, type CustomerInput } from '@shared/schemas/customer';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/select';
import { TextInput } from '@/components/ui/text-input';
import { useSaveRecord } from '@/api/directory';
import { RecordForm } from './record-form';
import { applyServerErrors } from '@/lib/apply-server-errors';

type Fields = z.input<typeof customerInputSchema>;
const NAMES = ['name', 'contactName', 'contactEmail', 'contactPhone', 'notes', 'capacityUnit'] as const;

export function CustomerForm({ customer, onDone }: { customer: Customer | null; onDone: () => void }) {
  const save = useSaveRecord('customers');
  const { register, handleSubmit, setError, formState: { errors } } = useForm<Fields, unknown, CustomerInput>({
    resolver: zodResolver(customerInputSchema),
    defaultValues: {
      name: customer?.name ?? '',
      contactName: customer?.contactName ?? '',
      contactEmail: customer?.contactEmail ?? '',
      contactPhone: customer?.contactPhone ?? '',
      notes: customer?.notes ?? '',
      capacityUnit: customer?.capacityUnit ?? 'us_ton',
    },
  });
  const onSubmit = handleSubmit(async (values) => {
    try {
      await save.mutateAsync({ id: customer?.id ?? null, values });
      onDone();
    } catch (error) {
      applyServerErrors({ setError }, error, NAMES);
    }
  });
  return (
    <RecordForm title={customer ? `Edit ${customer.name}` : 'Add a customer'} onSubmit={() => void onSubmit()} onCancel={onDone} busy={save.isPending} error={save.error}>
      <Field label="Customer name" error={errors.name?.message}>
        <TextInput {...register('name')} />
      </Field>
      <div className="grid gap-4 md:grid-cols-3">
        <Field label="Contact name" error={errors.contactName?.message}>
          <TextInput {...register('contactName')} />
        </Field>
        <Field label="Contact e-mail" hint="Visit reports are sent here" error={errors.contactEmail?.message}>
          <TextInput type="email" inputMode="email" autoCapitalize="none" {...register('contactEmail')} />
        </Field>
        <Field label="Contact phone" error={errors.contactPhone?.message}>
          <TextInput type="tel" {...register('contactPhone')} />
        </Field>
      </div>
      <Field
        label="Press capacity unit"
        hint={customer ? 'Every screen, report and e-mail states this customer’s press capacities in it. Changing it converts the capacity of each of the customer’s presses (1 US ton = 0.90718474 t).' : 'Every screen, report and e-mail states this customer’s press capacities in it.'}
        error={errors.capacityUnit?.message}
      >
        <Select {...register('capacityUnit')}>
          {CAPACITY_UNITS.map((unit) => (
            <option key={unit} value={unit}>
              {CAPACITY_UNIT_LABELS[unit]}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Notes" hint="Gate codes, opening hours, who to ask for" error={errors.notes?.message}>
        <TextInput {...register('notes')} />
      </Field>
    </RecordForm>
  );
}
