import { useState } from 'react';
import type { SafetyGateStep } from '@shared/schemas/procedure';
import type { StepResultRecord, VisitDetail } from '@shared/schemas/visit-detail';
import { Button } from '@/components/ui/button';
import { CheckboxCard } from '@/components/ui/checkbox-card';
import type { StepAnswerVars } from '@/api/visits';
import type { ResilientSave } from '../../hooks/use-resilient-save';
import { formatWhen, type PersonNames } from '../../lib/step-records';
import { SaveStatusBanner } from '../save-status-banner';

interface SafetyGateStepViewProps {
  step: SafetyGateStep;
  result: StepResultRecord | undefined;
  answer: ResilientSave<StepAnswerVars, VisitDetail>;
  editable: boolean;
  names: PersonNames;
}

/** Every point ticked, by the person standing at the press, before anything else goes on. */
export function SafetyGateStepView({ step, result, answer, editable, names }: SafetyGateStepViewProps) {
  const [ticked, setTicked] = useState<boolean[]>(() => step.confirmations.map(() => false));
  const confirmed = result !== undefined;
  const allTicked = ticked.every(Boolean);

  return (
    <fieldset className="space-y-4">
      <legend className="mb-2 text-lg font-semibold text-ink">Confirm each point</legend>
      <ul className="space-y-3">
        {step.confirmations.map((text, i) => (
          <li key={text}>
            <CheckboxCard
              label={text}
              align="start"
              checked={confirmed || ticked[i]}
              disabled={confirmed || !editable}
              onChange={(e) => setTicked((all) => all.map((v, j) => (j === i ? e.target.checked : v)))}
            />
          </li>
        ))}
      </ul>
      {confirmed ? (
        <p className="flex items-center gap-2 rounded-lg bg-verdict-in_band-soft px-4 py-3 text-lg text-ink">
          <span aria-hidden="true" className="font-bold text-verdict-in_band">
            ✓
          </span>
          Confirmed by {names(result.createdBy)} on {formatWhen(result.confirmedAt ?? result.createdAt)}.
        </p>
      ) : (
        <>
          <p className="text-base text-ink-muted">Your confirmation is recorded with your name and the time.</p>
          <SaveStatusBanner save={answer} what="your confirmation" />
          {editable && (
            <Button
              size="lg"
              disabled={!allTicked || answer.isSaving || answer.isWaitingToRetry}
              onClick={() => answer.save({ stepId: step.id, body: { id: crypto.randomUUID(), confirmed: true } })}
            >
              {answer.isSaving ? 'Recording…' : 'Confirm'}
            </Button>
          )}
          {editable && !allTicked && <p className="text-base text-ink-muted">Tick every point to confirm.</p>}
        </>
      )}
    </fieldset>
  );
}
