import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch, type Control, type FieldPath } from 'react-hook-form';
import type { BandSetVersionRecord } from '@shared/schemas/admin-reference';
import { bandSetValuesSchema, withoutBlankOptionals, type BandSetValues } from '@shared/schemas/band-set';
import { CIRCUITS } from '@shared/schemas/reading';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { CheckboxCard } from '@/components/ui/checkbox-card';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { Textarea } from '@/components/ui/textarea';
import { errorMessage, isApiError } from '@/lib/api-error';
import { bandSetsApi } from '@/api/band-sets';
import { NumberWithUnit } from '@/components/ui/number-with-unit';
import { FORM_MESSAGES } from '../lib/form-messages';
import { JudgementPreview } from './judgement-preview';
import { VoltageRangeFields } from './voltage-range-fields';
import { WindingBandFields } from './winding-band-fields';

const resolver = zodResolver(bandSetValuesSchema, FORM_MESSAGES);

/** Watches the form on its own, so typing re-renders only the preview, not every field. */
function LivePreview({ control }: { control: Control<BandSetValues> }) {
  return <JudgementPreview bands={useWatch({ control })} />;
}

interface BandSetFormProps {
  record: BandSetVersionRecord;
  /** Published versions are shown read-only: they are what visits ran with. */
  editable: boolean;
}

/** The values of one band-set version; a draft can be edited and saved, and tried in the preview box. */
export function BandSetForm({ record, editable }: BandSetFormProps) {
  const save = bandSetsApi.useSaveDraft();
  const {
    register,
    handleSubmit,
    control,
    setError,
    formState: { errors, isDirty },
    reset,
  } = useForm<BandSetValues>({ resolver: (values, context, options) => resolver(withoutBlankOptionals(values), context, options), defaultValues: record.bands, mode: 'onBlur' });
  const num = { valueAsNumber: true } as const;

  const onSubmit = handleSubmit(async (bands) => {
    try {
      const saved = await save.mutateAsync({ id: record.id, body: { bands } });
      reset(saved.bands);
    } catch (error) {
      if (!isApiError(error)) return;
      for (const [path, message] of Object.entries(error.fields)) {
        setError(path.replace(/^bands\./, '') as FieldPath<BandSetValues>, { message });
      }
    }
  });

  return (
    <div className="grid gap-6 xl:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
      <form onSubmit={onSubmit} noValidate className="space-y-6" aria-label={`Band set ${record.generation} version ${record.version}`}>
        {save.isError && (
          <Banner tone="error" role="alert" title="The draft was not saved">
            {errorMessage(save.error)}
          </Banner>
        )}
        {save.isSuccess && !isDirty && (
          <Banner role="status" title="Draft saved">
            Publish it when the values are checked; visits keep using the current version until then.
          </Banner>
        )}
        {/* A disabled fieldset makes a published version read-only while the preview still reads its values. */}
        <fieldset disabled={!editable} className="space-y-6">
        <Field label="Label" error={errors.label?.message}>
          <TextInput {...register('label')} />
        </Field>
        <div className="grid gap-4 sm:grid-cols-2">
          <NumberWithUnit label="Reference temperature" unit="°C" hint="Readings are corrected to this winding temperature" error={errors.referenceTemperatureC?.message} registration={register('referenceTemperatureC', num)} />
          <NumberWithUnit label="Stator balance limit" unit="%" hint="Flag stators that differ by more than this" error={errors.statorBalancePercent?.message} registration={register('statorBalancePercent', num)} />
        </div>
        {CIRCUITS.map((circuit) => (
          <WindingBandFields key={circuit} circuit={circuit} register={register} errors={errors} />
        ))}
        <VoltageRangeFields name="excitation" title="Excitation voltage (R1–R2)" register={register} errors={errors} />
        <VoltageRangeFields name="statorOutputMagnitude" title="Stator output magnitude √(V(S1–S3)² + V(S2–S4)²)" register={register} errors={errors} />
        <fieldset className="space-y-4 rounded-lg border border-surface-line p-4">
          <legend className="px-1 text-xl font-semibold text-ink">Transformation ratio and excitation frequency (optional)</legend>
          <div className="grid gap-4 sm:grid-cols-3">
            <NumberWithUnit label="Ratio lowest" unit="" error={errors.transformationRatio?.min?.message} registration={register('transformationRatio.min', num)} />
            <NumberWithUnit label="Ratio highest" unit="" error={errors.transformationRatio?.max?.message} registration={register('transformationRatio.max', num)} />
            <NumberWithUnit label="Ratio near-edge margin" unit="%" error={errors.transformationRatio?.nearEdgePercent?.message} registration={register('transformationRatio.nearEdgePercent', num)} />
          </div>
          <NumberWithUnit label="Excitation frequency" unit="Hz" hint="The meter's AC bandwidth must cover it" error={errors.excitationFrequencyHz?.message} registration={register('excitationFrequencyHz', num)} />
        </fieldset>
        <CheckboxCard label="These are invented demo values, not a manufacturer’s figures" registration={register('invented')} />
        <Field label="Note" hint="Where the values come from" error={errors.note?.message}>
          <Textarea rows={3} {...register('note')} />
        </Field>
        </fieldset>
        {editable && (
          <Button type="submit" size="lg" disabled={save.isPending}>
            {save.isPending ? 'Saving…' : 'Save draft'}
          </Button>
        )}
      </form>
      <div>
        <LivePreview control={control} />
      </div>
    </div>
  );
}
