import type { ReactNode } from 'react';
import { STEP_KIND_LABELS, type Step } from '@shared/schemas/procedure';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { Banner } from '@/components/ui/banner';
import { SafetyNotice, defersToPlant, signalLevel } from '@/components/ui/safety-notice';
import { useAnswerStep } from '../../hooks/use-answer-step';
import { currentResult, isVisitOpen, type PersonNames } from '../../lib/step-records';
import { FindingView } from './finding-view';
import { FirmwareStepView } from './firmware-step';
import { MeasureStepView } from './measure-step';
import { OutcomeStepView } from './outcome-step';
import { SafetyGateStepView } from './safety-gate-step';
import { StepConflict } from './step-conflict';
import { StepHistory } from './step-history';

interface StepPanelProps {
  visit: VisitDetail;
  step: Step;
  names: PersonNames;
  /** Called with the server's answer, so the page can move on to the step it says is next. */
  onAnswered: (visit: VisitDetail) => void;
  renderPhotos: (stepId: string, prompt: string) => ReactNode;
  /** Where readings typed and not saved yet are kept on this device. */
  readingsDraftKey?: string;
}

/** One step: its title, instructions, safety message, inputs and history. */
export function StepPanel({ visit, step, names, onAnswered, renderPhotos, readingsDraftKey }: StepPanelProps) {
  const answer = useAnswerStep(visit.id, onAnswered);
  const result = currentResult(visit, step.id);
  const editable = isVisitOpen(visit);
  const noLongerApplies = visit.traversal.noLongerApply.includes(step.id);
  const photos = (prompt: string) => renderPhotos(step.id, prompt);

  return (
    <section aria-labelledby="step-title" className="space-y-5">
      <header className="space-y-1">
        <p className="text-base font-semibold uppercase tracking-wide text-ink-muted">{STEP_KIND_LABELS[step.kind]}</p>
        <h2 id="step-title" className="text-2xl font-bold text-ink">
          {step.title}
        </h2>
      </header>
      {noLongerApplies && (
        <Banner title="This answer no longer applies">
          An earlier answer changed the path, so this step is no longer on it. Its answer is kept in the history.
        </Banner>
      )}
      <p className="whitespace-pre-line text-lg text-ink">{step.instructions}</p>
      {[...(step.safety ? [step.safety] : []), ...(step.cautions ?? [])].map((message) => (
        <SafetyNotice key={message.text} level={signalLevel(message.signalWord)} defersAlready={defersToPlant(message.text)}>
          {message.text}
        </SafetyNotice>
      ))}
      {/* Keyed by the answer, so a new answer from the server resets the drafts to it; a measure step
          keeps its typed readings (and any save still waiting to be retried). */}
      <StepBody key={step.kind === 'measure' ? step.id : `${step.id}-${result?.id ?? 'none'}`} {...{ visit, step, result, answer, editable: editable && !noLongerApplies, names, photos, readingsDraftKey }} />
      <StepHistory visit={visit} step={step} names={names} />
      <StepConflict step={step} answer={answer} names={names} />
    </section>
  );
}

function StepBody({
  visit,
  step,
  result,
  answer,
  editable,
  names,
  photos,
  readingsDraftKey,
}: {
  visit: VisitDetail;
  step: Step;
  result: ReturnType<typeof currentResult>;
  answer: ReturnType<typeof useAnswerStep>;
  editable: boolean;
  names: PersonNames;
  photos: (prompt: string) => ReactNode;
  readingsDraftKey?: string;
}) {
  switch (step.kind) {
    case 'safety_gate':
      return <SafetyGateStepView step={step} result={result} answer={answer} editable={editable} names={names} />;
    case 'firmware':
      return <FirmwareStepView visit={visit} step={step} result={result} answer={answer} editable={editable} />;
    case 'measure':
      return <MeasureStepView visit={visit} step={step} result={result} answer={answer} editable={editable} draftKey={readingsDraftKey} />;
    case 'finding':
      return <FindingView step={step} visitId={visit.id} reached={visit.traversal.findingIds.includes(step.id)} />;
    default:
      return <OutcomeStepView visit={visit} step={step} result={result} answer={answer} editable={editable} renderPhotos={photos} />;
  }
}
