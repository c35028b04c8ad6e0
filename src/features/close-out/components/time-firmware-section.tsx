import { useWatch } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { Section } from '@/components/ui/section';
import { TextInput } from '@/components/ui/text-input';
import { useCloseOutForm } from '../hooks/use-close-out-form';
import { emptyAsAbsent, hoursAndMinutes } from '../utils/close-out-values';

function MinutesField({ name, label }: { name: 'labourMinutes' | 'travelMinutes'; label: string }) {
  const { register, control, errors } = useCloseOutForm();
  const hours = hoursAndMinutes(useWatch({ control, name }));
  return (
    <Field label={label} hint={hours ? `= ${hours} (hours:minutes)` : 'Whole minutes, e.g. 90 for 1:30'} error={errors[name]?.message}>
      <TextInput inputMode="numeric" autoComplete="off" {...register(name, { setValueAs: emptyAsAbsent })} />
    </Field>
  );
}

/** Time on the job and the firmware the press was left with. */
export function TimeFirmwareSection() {
  const { register, errors } = useCloseOutForm();
  return (
    <Section variant="form" title="Time and firmware">
      <div className="grid gap-4 sm:grid-cols-2">
        <MinutesField name="labourMinutes" label="Labour minutes" />
        <MinutesField name="travelMinutes" label="Travel minutes" />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Press-control firmware as left" hint="Filled in as found; change it if you updated it." error={errors.controlFirmwareLeft?.message}>
          <TextInput inputMode="decimal" spellCheck={false} {...register('controlFirmwareLeft')} />
        </Field>
        <Field label="Monitor-module firmware as left" hint="Filled in as found; change it if you updated it." error={errors.monitorFirmwareLeft?.message}>
          <TextInput inputMode="decimal" spellCheck={false} {...register('monitorFirmwareLeft')} />
        </Field>
      </div>
    </Section>
  );
}
