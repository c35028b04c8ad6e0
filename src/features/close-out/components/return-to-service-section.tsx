import { useWatch } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { Section } from '@/components/ui/section';
import { SafetyNotice } from '@/components/ui/safety-notice';
import { TextInput } from '@/components/ui/text-input';
import { useCloseOutForm } from '../hooks/use-close-out-form';
import { emptyAsAbsent } from '../utils/close-out-values';
import { CheckboxCard } from '@/components/ui/checkbox-card';
import { RadioCards } from '@/components/ui/radio-cards';
import { SafetyDistanceNote } from './safety-distance-note';

/** The post-repair checks that must pass before the press goes back to production. */
export function ReturnToServiceSection() {
  const { register, control, errors } = useCloseOutForm();
  const rts = errors.returnToService;
  const stoppingTime = useWatch({ control, name: 'returnToService.stoppingTimeMs' });

  return (
    <Section variant="form" title="Return to service">
      <SafetyNotice level="warning">
        A press returned to production with a wrong crank-angle reading or a slow brake can stroke when nobody expects it and
        crush or amputate. Confirm each check below yourself, on this press, before it runs production again; remove locks
        and tags only as the plant’s lockout procedure allows.
      </SafetyNotice>
      <div className="space-y-3">
        <CheckboxCard label="The fault has cleared on the control" error={rts?.faultCleared?.message} registration={register('returnToService.faultCleared')} />
        <CheckboxCard
          label="The crank-angle display reads top dead centre with the slide at the top of its stroke"
          error={rts?.tdcAgrees?.message}
          registration={register('returnToService.tdcAgrees')}
        />
        <CheckboxCard
          label="The stopping-time / brake-monitor check passed"
          error={rts?.stoppingTimeChecked?.message}
          registration={register('returnToService.stoppingTimeChecked')}
        />
      </div>
      <Field label="Measured stopping time in ms (optional)" hint="As shown by the stop-time meter or brake monitor, e.g. 180." error={rts?.stoppingTimeMs?.message}>
        <TextInput inputMode="numeric" autoComplete="off" {...register('returnToService.stoppingTimeMs', { setValueAs: emptyAsAbsent })} />
      </Field>
      <SafetyDistanceNote stoppingTime={stoppingTime} />
      <RadioCards
        legend="Presence-sensing device distance"
        hint="If a device sits closer than its safety distance, do not return the press to production: have the mounting corrected first."
        options={[
          { value: 'yes', label: 'At or beyond its safety distance' },
          { value: 'not_fitted', label: 'No presence-sensing device fitted' },
        ]}
        error={rts?.presenceSensingDistanceOk?.message}
        registration={register('returnToService.presenceSensingDistanceOk')}
      />
    </Section>
  );
}
