import { customerInputSchema, type Customer } from '@shared/schemas/customer';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { useRecordForm } from '../hooks/use-record-form';
import { RecordForm } from './record-form';

const NAMES = ['name', 'contactName', 'contactEmail', 'contactPhone', 'notes'] as const;

export function CustomerForm({ customer, onDone }: { customer: Customer | null; onDone: () => void }) {
  const { save, register, errors, onSubmit } = useRecordForm({ resource: 'customers', schema: customerInputSchema, record: customer, names: NAMES, onDone });
  return (
    <RecordForm title={customer ? `Edit ${customer.name}` : 'Add a customer'} onSubmit={onSubmit} onCancel={onDone} busy={save.isPending} error={save.error}>
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
      <Field label="Notes" hint="Gate codes, opening hours, who to ask for" error={errors.notes?.message}>
        <TextInput {...register('notes')} />
      </Field>
    </RecordForm>
  );
}
