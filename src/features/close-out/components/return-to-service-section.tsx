import { useWatch } from 'react-hook-form';
import type { ReturnToServiceNeeds } from '@shared/domain/return-to-service';
import { Field } from '@/components/ui/field';
import { Section } from '@/components/ui/section';
import { SafetyNotice } from '@/components/ui/safety-notice';
import { TextInput } from '@/components/ui/text-input';
import { useCloseOutForm } from '../hooks/use-close-out-form';
import { emptyAsAbsent } from '../utils/close-out-values';
import { CheckboxCard } from '@/components/ui/checkbox-card';
import { RadioCards } from '@/components/ui/radio-cards';
import { SafetyDistanceNote } from './safety-distance-note';

/** The two safeguard questions: where the presence-sensing device and the two-hand stations stand. */
const SAFEGUARD_QUESTIONS = [
  {
    name: 'presenceSensingDistanceOk',
    legend: 'Presence-sensing device distance',
    hint: 'If a device sits closer than its safety distance, do not return the press to production: have the mounting corrected first.',
    options: [
      { value: 'yes', label: 'At or beyond its safety distance' },
      { value: 'not_fitted', label: 'No presence-sensing device fitted' },
    ],
  },
  {
    name: 'twoHandDevice',
    legend: 'Two-hand stations',
    hint: 'A two-hand control or trip closer than its safety distance lets a hand reach the die before the slide stops: have it moved first.',
    options: [
      { value: 'control', label: 'Two-hand control fitted' },
      { value: 'trip', label: 'Two-hand trip fitted' },
      { value: 'not_fitted', label: 'Neither fitted' },
    ],
  },
] as const;

/** The post-repair checks that must pass before the press goes back to production. */
export function ReturnToServiceSection({ needs }: { needs: ReturnToServiceNeeds }) {
  const { register, control, errors } = useCloseOutForm();
  const rts = errors.returnToService;
  const values = useWatch({ control, name: 'returnToService' });
  const twoHand = values?.twoHandDevice;

  return (
    <Section variant="form" title="Return to service">
      <SafetyNotice level="warning">
        A press returned to production with a wrong crank-angle reading, a guard left off or a slow brake can stroke when nobody expects
        it and crush or amputate. Confirm each check below yourself, on this press, before it runs production again; remove locks and
        tags only as the plant’s lockout procedure allows.
      </SafetyNotice>
      <div className="space-y-3">
        <CheckboxCard label="The fault has cleared on the control" error={rts?.faultCleared?.message} registration={register('returnToService.faultCleared')} />
        <CheckboxCard
          label="The crank-angle display reads top dead centre with the slide at the top of its stroke"
          error={rts?.tdcAgrees?.message}
          registration={register('returnToService.tdcAgrees')}
        />
        {needs.crankAngleSettings && (
          <CheckboxCard
            label="After the sensor work, every setting taken from the crank angle is verified: top stop, light-curtain muting only on the upstroke, and any cam outputs"
            error={rts?.crankAngleSettingsVerified?.message}
            registration={register('returnToService.crankAngleSettingsVerified')}
          />
        )}
        <CheckboxCard
          label="Every guard, cover and enclosure door is back in place, and its interlock works"
          error={rts?.guardsRefitted?.message}
          registration={register('returnToService.guardsRefitted')}
        />
        <CheckboxCard label="Every tool and die safety block is out of the press" error={rts?.toolsRemoved?.message} registration={register('returnToService.toolsRemoved')} />
        <CheckboxCard label="Everyone was clear of the press before the first stroke" error={rts?.everyoneClear?.message} registration={register('returnToService.everyoneClear')} />
        <CheckboxCard label="A single stroke stopped at the top without repeating" error={rts?.singleStroke?.message} registration={register('returnToService.singleStroke')} />
        <CheckboxCard
          label="The stopping time, measured at about 90° on the downstroke, is within the press’s limit"
          error={rts?.stoppingTimeChecked?.message}
          registration={register('returnToService.stoppingTimeChecked')}
        />
      </div>
      <Field
        label={`Measured stopping time in ms${twoHand === 'control' ? '' : ' (optional)'}`}
        hint="Measured with a stop-time measuring device at about 90° on the downstroke, e.g. 180. Not the brake monitor’s top-stop reading: that is a different stop."
        error={rts?.stoppingTimeMs?.message}
      >
        <TextInput inputMode="decimal" autoComplete="off" className="max-w-[12rem]" {...register('returnToService.stoppingTimeMs', { setValueAs: emptyAsAbsent })} />
      </Field>
      {SAFEGUARD_QUESTIONS.map((q) => (
        <RadioCards key={q.name} legend={q.legend} hint={q.hint} options={q.options} error={rts?.[q.name]?.message} registration={register(`returnToService.${q.name}`)} />
      ))}
      {twoHand === 'trip' && (
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Strokes per minute" hint="The press’s single-stroke rate, e.g. 40." error={rts?.strokesPerMinute?.message}>
            <TextInput inputMode="decimal" autoComplete="off" className="max-w-[12rem]" {...register('returnToService.strokesPerMinute', { setValueAs: emptyAsAbsent })} />
          </Field>
          <Field label="Engaging points of the clutch" hint="Per revolution, from the clutch’s data, e.g. 4." error={rts?.engagingPoints?.message}>
            <TextInput inputMode="numeric" autoComplete="off" className="max-w-[12rem]" {...register('returnToService.engagingPoints', { setValueAs: emptyAsAbsent })} />
          </Field>
        </div>
      )}
      <SafetyDistanceNote values={values} />
      {twoHand && twoHand !== 'not_fitted' && (
        <CheckboxCard
          label="Every two-hand station sits at or beyond the safety distance shown"
          error={rts?.twoHandDistanceOk?.message}
          registration={register('returnToService.twoHandDistanceOk')}
        />
      )}
    </Section>
  );
}
