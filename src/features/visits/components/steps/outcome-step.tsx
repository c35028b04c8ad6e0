import { useState, type ReactNode } from 'react';
import type { Step } from '@shared/schemas/procedure';
import type { StepResultRecord, VisitDetail } from '@shared/schemas/visit-detail';
import { Button } from '@/components/ui/button';
import { cn } from '@/lib/cn';
import type { StepAnswerVars } from '@/api/visits';
import type { ResilientSave } from '../../hooks/use-resilient-save';
import { answerInputs } from '../../lib/step-records';
import { SaveStatusBanner } from '../save-status-banner';
import { serverFieldErrors } from '@/lib/apply-server-errors';
import { StepInputFields } from './step-input-fields';

type OutcomeStep = Extract<Step, { kind: 'check' | 'choice' | 'inspect' }>;

interface OutcomeStepViewProps {
  visit: VisitDetail;
  step: OutcomeStep;
  result: StepResultRecord | undefined;
  answer: ResilientSave<StepAnswerVars, VisitDetail>;
  editable: boolean;
  renderPhotos: (prompt: string) => ReactNode;
}

/** Check, choice and inspect steps: any inputs, then one big button per outcome. */
export function OutcomeStepView({ visit, step, result, answer, editable, renderPhotos }: OutcomeStepViewProps) {
  const inputs = step.inputs ?? [];
  const [values, setValues] = useState<Record<string, string>>(() => {
    const given = answerInputs(result);
    const generation = inputs.find((i) => i.type === 'sensor_generation');
    if (generation && !given[generation.key] && visit.bandSet) given[generation.key] = visit.bandSet.generation;
    return given;
  });
  const [missing, setMissing] = useState<Record<string, string>>({});
  const errors = { ...(answer.isRejected ? serverFieldErrors(answer.error, 'inputs.') : {}), ...missing };

  const choose = (outcome: string) => {
    const blank = Object.fromEntries(
      inputs.filter((i) => i.required && i.type !== 'photo' && !values[i.key]?.trim()).map((i) => [i.key, `${i.label} is needed before you go on.`]),
    );
    setMissing(blank);
    if (Object.keys(blank).length > 0) return;
    const filled = Object.fromEntries(
      inputs.filter((i) => i.type !== 'photo' && values[i.key]?.trim()).map((i) => [i.key, values[i.key]!.trim()]),
    );
    answer.save({ stepId: step.id, body: { id: crypto.randomUUID(), outcome, ...(Object.keys(filled).length ? { inputs: filled } : {}) } });
  };

  return (
    <div className="space-y-5">
      {step.kind === 'inspect' && (
        <div className="space-y-2">
          <p className="text-lg text-ink">
            <span className="font-semibold">Photograph: </span>
            {step.photoPrompt}
          </p>
          {renderPhotos(step.photoPrompt)}
        </div>
      )}
      {inputs.length > 0 && (
        <StepInputFields
          inputs={inputs}
          values={values}
          errors={errors}
          onChange={(key, value) => setValues((v) => ({ ...v, [key]: value }))}
          bandSets={visit.availableBandSets}
          renderPhotos={renderPhotos}
          disabled={!editable}
        />
      )}
      <SaveStatusBanner save={answer} what="your answer" />
      <div role="group" aria-label="Outcome" className="grid gap-3 sm:grid-cols-2">
        {step.outcomes.map((o) => {
          const chosen = result?.outcome === o.value;
          return (
            <Button
              key={o.value}
              size="lg"
              variant={chosen ? 'primary' : 'secondary'}
              aria-pressed={chosen}
              disabled={!editable || answer.isSaving || answer.isWaitingToRetry}
              className={cn('min-h-16 justify-start text-left', chosen && 'ring-[3px] ring-accent ring-offset-2')}
              onClick={() => choose(o.value)}
            >
              {chosen && <span aria-hidden="true">✓</span>}
              {o.label}
            </Button>
          );
        })}
      </div>
      {result && editable && (
        <p className="text-base text-ink-muted">Choosing a different answer re-runs the steps after this one; earlier answers are kept in the history.</p>
      )}
    </div>
  );
}
