import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import type { Press } from '@shared/schemas/press';
import { visitCreateSchema, type VisitCreateInput } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { RadioCards } from '@/components/ui/radio-cards';
import { TextInput } from '@/components/ui/text-input';
import { applyServerErrors } from '@/lib/apply-server-errors';
import { errorMessage } from '@/lib/api-error';
import { useCreateVisit } from '@/api/visits';
import { suggestProcedure } from '../../lib/suggest-procedure';
import { PressPicker } from './press-picker';

type StartFields = z.input<typeof visitCreateSchema>;
const FIELD_NAMES = ['pressId', 'faultDisplayed', 'controlFirmwareFound', 'monitorFirmwareFound', 'procedureKey'] as const;

/** Press, fault as displayed, firmware as found and the procedure: everything needed to start. */
export function StartVisitForm({ initialPress, onStarted }: { initialPress: Press | null; onStarted: (visit: VisitDetail) => void }) {
  const id = useId();
  const create = useCreateVisit();
  const [press, setPress] = useState<Press | null>(initialPress);
  const {
    register,
    handleSubmit,
    setValue,
    setError,
    control,
    formState: { errors, isSubmitting },
  } = useForm<StartFields, unknown, VisitCreateInput>({
    resolver: zodResolver(visitCreateSchema),
    defaultValues: {
      pressId: initialPress?.id ?? 0,
      faultDisplayed: '',
      controlFirmwareFound: initialPress?.controlFirmware ?? '',
      monitorFirmwareFound: initialPress?.monitorFirmware ?? '',
      procedureKey: 'crank-angle-sensor-circuit',
    },
  });
  const suggestion = suggestProcedure(useWatch({ control, name: 'faultDisplayed' }) ?? '');

  const choosePress = (next: Press | null) => {
    setPress(next);
    setValue('pressId', next?.id ?? 0, { shouldValidate: next !== null });
    // Pre-filled from the press record; the technician corrects them to what the displays show.
    setValue('controlFirmwareFound', next?.controlFirmware ?? '');
    setValue('monitorFirmwareFound', next?.monitorFirmware ?? '');
  };

  const onSubmit = handleSubmit(async (values) => {
    try {
      onStarted(await create.mutateAsync(values));
    } catch (error) {
      applyServerErrors({ setError }, error, FIELD_NAMES);
    }
  });

  return (
    <div className="space-y-8">
      <PressPicker press={press} onChange={choosePress} error={errors.pressId?.message} errorId={`${id}-press-error`} />
      <form onSubmit={onSubmit} noValidate aria-label="Start a visit" className="space-y-6">
        {create.isError && (
          <Banner tone="error" role="alert" title="The visit has not started">
            {errorMessage(create.error)}
          </Banner>
        )}
        <input type="hidden" {...register('pressId')} />
        <Field label="Fault as displayed" hint="Type it exactly as the control shows it, codes included." error={errors.faultDisplayed?.message}>
          <TextInput autoComplete="off" {...register('faultDisplayed')} />
        </Field>
        <fieldset className="space-y-3">
          <legend className="text-lg font-semibold text-ink">Firmware as found</legend>
          <p className="text-base text-ink-muted">Filled in from the press record. Correct them to what the displays show today.</p>
          <div className="grid gap-4 sm:grid-cols-2">
            <Field label="Press control firmware" error={errors.controlFirmwareFound?.message}>
              <TextInput inputMode="decimal" autoComplete="off" {...register('controlFirmwareFound')} />
            </Field>
            <Field label="Monitor module firmware" error={errors.monitorFirmwareFound?.message}>
              <TextInput inputMode="decimal" autoComplete="off" {...register('monitorFirmwareFound')} />
            </Field>
          </div>
        </fieldset>
        <RadioCards
          legend="Procedure"
          columns={1}
          options={[{ value: suggestion.choice.key, label: suggestion.choice.title, detail: suggestion.because }]}
          error={errors.procedureKey?.message}
          registration={register('procedureKey')}
        />
        <Button type="submit" size="lg" disabled={isSubmitting || create.isPending}>
          {isSubmitting || create.isPending ? 'Starting…' : 'Start the visit'}
        </Button>
      </form>
    </div>
  );
}
