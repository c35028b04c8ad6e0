import { useState } from 'react';
import { judgeEntry, OTHER_STATOR, type EntryContext } from '@shared/domain/judge-entry';
import type { ResolverOutput } from '@shared/domain/resolver-output';
import type { MeasureStep, ReadingSpec } from '@shared/schemas/procedure';
import type { StepResultRecord, VisitDetail } from '@shared/schemas/visit-detail';
import { Button } from '@/components/ui/button';
import type { StepAnswerVars } from '@/api/visits';
import type { ResilientSave } from '../../hooks/use-resilient-save';
import { conditionsKey, draftFromReading, parseConditions, storedConditions } from '../../lib/reading-conditions';
import { answerInputs, answerReason, currentReadings, outcomeLabel } from '../../lib/step-records';
import { SaveStatusBanner } from '../save-status-banner';
import { restoreUnsaved, useKeepUnsaved } from '../../hooks/use-unsaved-readings';
import { RestoredNotice } from '@/components/ui/restored-notice';
import { GenerationPicker } from './generation-picker';
import { ReadingConditionsFields } from './reading-conditions-fields';
import { ReadingInput } from './reading-input';
import { ResolverPanel } from './resolver-panel';
import { YesNoField } from './step-input-fields';
import { serverFieldErrors } from '@/lib/apply-server-errors';

interface MeasureStepViewProps {
  visit: VisitDetail;
  step: MeasureStep;
  result: StepResultRecord | undefined;
  answer: ResilientSave<StepAnswerVars, VisitDetail>;
  editable: boolean;
  /** Where readings typed but not saved yet are kept on this device (per person and visit). */
  draftKey?: string;
}

const formatFrequency = (hz: number) => (hz >= 1000 ? `${Number((hz / 1000).toPrecision(4))} kHz` : `${hz} Hz`);

const specMatches = (spec: ReadingSpec) => (r: { quantity: string; circuit: string; position: string }) =>
  r.quantity === spec.quantity && r.circuit === spec.circuit && r.position === spec.position;

/** The two stator voltages are judged together (their vector magnitude does not change with crank angle), and the excitation gives the transformation ratio. */
function contextFor(spec: ReadingSpec, specs: ReadingSpec[], drafts: Record<string, string>): EntryContext {
  if (spec.quantity !== 'ac_voltage' || spec.circuit === 'rotor') return {};
  const partner = specs.find((s) => s.quantity === 'ac_voltage' && s.position === spec.position && s.circuit === OTHER_STATOR[spec.circuit as 'stator_1' | 'stator_2']);
  const excitation = specs.find((s) => s.quantity === 'ac_voltage' && s.position === spec.position && s.circuit === 'rotor');
  return { otherStatorEntered: partner ? drafts[partner.key] : undefined, excitationEntered: excitation ? drafts[excitation.key] : undefined };
}

export function MeasureStepView({ visit, step, result, answer, editable, draftKey }: MeasureStepViewProps) {
  const stored = currentReadings(visit, step.id);
  const savedEntries = () => Object.fromEntries(step.readings.map((spec) => [spec.key, stored.find(specMatches(spec))?.entered ?? '']));
  const [initial] = useState(() => restoreUnsaved(draftKey, step, savedEntries()));
  const [drafts, setDrafts] = useState<Record<string, string>>(initial.drafts);
  const [restoredAt, setRestoredAt] = useState(initial.restoredAt);
  useKeepUnsaved(draftKey, step, drafts, savedEntries());
  const discardRestored = () => {
    setDrafts(savedEntries());
    setRestoredAt(null);
  };
  const [conditionsDraft, setConditionsDraft] = useState(() => draftFromReading(stored.find((r) => r.quantity === 'resistance')));
  const [resaveRound, setResaveRound] = useState(0);
  const [generation, setGeneration] = useState(visit.generationSuggestion?.best?.generation ?? '');
  const questions = (step.inputs ?? []).filter((i) => i.type === 'yes_no');
  const [answers, setAnswers] = useState<Record<string, string>>(() => answerInputs(result));
  const [missing, setMissing] = useState<Record<string, string>>({});
  const inputErrors = { ...(answer.isRejected ? serverFieldErrors(answer.error, 'inputs.') : {}), ...missing };
  const bands = visit.bandSet?.bands ?? null;
  const isResistance = step.readings.some((s) => s.quantity === 'resistance');
  const { conditions, errors } = parseConditions(conditionsDraft);
  const readingConditions = isResistance ? conditions : {};
  const outdated = isResistance && stored.some((r) => conditionsKey(storedConditions(r)) !== conditionsKey(conditions));

  let resolver: ResolverOutput | null = null;
  if (bands && step.readings.some((s) => s.quantity === 'ac_voltage' && s.circuit !== 'rotor')) {
    const sine = step.readings.find((s) => s.quantity === 'ac_voltage' && s.circuit === 'stator_1');
    if (sine && drafts[sine.key]?.trim()) {
      const j = judgeEntry({ quantity: 'ac_voltage', circuit: 'stator_1', position: sine.position, entered: drafts[sine.key]! }, bands, contextFor(sine, step.readings, drafts));
      if (j.status === 'judged' && j.figures.kind === 'ac_voltage') resolver = j.figures.output;
    }
  }

  const done = () => {
    const blank = Object.fromEntries(questions.filter((q) => q.required && !answers[q.key]).map((q) => [q.key, 'Answer this before the step is judged.']));
    setMissing(blank);
    if (Object.keys(blank).length > 0) return;
    const inputs = {
      ...Object.fromEntries(questions.filter((q) => answers[q.key]).map((q) => [q.key, answers[q.key]!])),
      ...(!visit.bandSet && generation ? { sensor_generation: generation } : {}),
    };
    answer.save({ stepId: step.id, body: { id: crypto.randomUUID(), ...(Object.keys(inputs).length ? { inputs } : {}) } });
  };
  const frequency = bands?.excitationFrequencyHz;

  return (
    <div className="space-y-4">
      {restoredAt && <RestoredNotice savedAt={restoredAt} onDiscard={discardRestored} what="readings you typed" />}
      <p className="rounded-lg bg-surface-sunken px-4 py-3 text-lg text-ink">
        <span className="font-semibold">Meter setting: </span>
        {step.meterSetting}
        {step.readings.some((s) => s.quantity === 'ac_voltage') && (
          <span className="mt-1 block">
            {frequency
              ? `Excitation frequency for this sensor generation: ${formatFrequency(frequency)}.`
              : 'This band set gives no excitation frequency: use a true-RMS meter and check its AC bandwidth against the control maker’s data.'}
          </span>
        )}
      </p>
      {!visit.bandSet && (
        <GenerationPicker suggestion={visit.generationSuggestion} bandSets={visit.availableBandSets} value={generation} onChange={setGeneration} disabled={!editable} />
      )}
      {isResistance && (
        <ReadingConditionsFields
          draft={conditionsDraft}
          errors={errors}
          onChange={setConditionsDraft}
          onResave={outdated && Object.keys(errors).length === 0 ? () => setResaveRound((n) => n + 1) : undefined}
          disabled={!editable}
        />
      )}
      <div className="space-y-3">
        {step.readings.map((spec) => (
          <ReadingInput
            key={spec.key}
            visitId={visit.id}
            stepId={step.id}
            spec={spec}
            draft={drafts[spec.key] ?? ''}
            onDraftChange={(text) => setDrafts((d) => ({ ...d, [spec.key]: text }))}
            bands={bands}
            context={contextFor(spec, step.readings, drafts)}
            conditions={readingConditions}
            stored={stored.find(specMatches(spec))}
            resaveRound={resaveRound}
            disabled={!editable}
          />
        ))}
      </div>
      {step.readings.some((s) => s.quantity === 'ac_voltage' && s.circuit !== 'rotor') && <ResolverPanel output={resolver} />}
      {questions.map((q) => (
        <YesNoField
          key={q.key}
          label={frequency ? `${q.label} (${formatFrequency(frequency)})` : q.label}
          value={answers[q.key] ?? ''}
          error={inputErrors[q.key]}
          disabled={!editable}
          onChange={(value) => {
            setMissing((m) => Object.fromEntries(Object.entries(m).filter(([k]) => k !== q.key)));
            setAnswers((a) => ({ ...a, [q.key]: value }));
          }}
        />
      ))}
      {questions.some((q) => q.key === 'meter_covers_frequency') && answers.meter_covers_frequency === 'no' && (
        <p className="rounded-lg bg-surface-sunken px-4 py-3 text-base text-ink">
          The step will be judged by the transformation ratio only: a meter that reads low at this frequency reads the excitation and the outputs low
          by about the same factor, so their ratio still holds. Absolute volts are shown but not judged.
        </p>
      )}
      {result && (
        <div className="rounded-lg border border-surface-line bg-surface-raised p-4 text-lg text-ink">
          <p>
            <span className="font-semibold">Step judged: </span>
            {outcomeLabel(step, result.outcome)}
          </p>
          {answerReason(result) && <p className="text-ink-muted">{answerReason(result)}</p>}
        </div>
      )}
      <SaveStatusBanner save={answer} what="the step answer" />
      {editable && (
        <Button size="lg" disabled={answer.isSaving} onClick={done}>
          {answer.isSaving ? 'Judging…' : 'Done — judge this step'}
        </Button>
      )}
    </div>
  );
}
