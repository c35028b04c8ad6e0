import { CAPACITY_UNIT_LABELS, CAPACITY_UNITS } from '@shared/format/capacity';
import { customerInputSchema, type Customer } from '@shared/schemas/customer';
import { Select } from '@/components/ui/select';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { useRecordForm } from '../hooks/use-record-form';
import { RecordForm } from './record-form';

const NAMES = ['name', 'contactName', 'contactEmail', 'contactPhone', 'notes', 'capacityUnit'] as const;

export function CustomerForm({ customer, onDone }: { customer: Customer | null; onDone: () => void }) {
  const { save, register, errors, onSubmit } = useRecordForm({ resource: 'customers', schema: customerInputSchema, record: customer, names: NAMES, fallback: { capacityUnit: 'us_ton' }, onDone });
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
