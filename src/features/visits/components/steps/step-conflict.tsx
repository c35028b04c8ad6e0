import { useQueryClient } from '@tanstack/react-query';
import type { Step } from '@shared/schemas/procedure';
import type { StaleVersionCurrent, StepResultRecord, VisitDetail } from '@shared/schemas/visit-detail';
import { ConflictDialog } from '@/components/ui/conflict-dialog';
import { visitKeys, type StepAnswerVars } from '@/api/visits';
import { isStaleVersion } from '@/lib/api-error';
import type { ResilientSave } from '../../hooks/use-resilient-save';
import { answerInputs, formatWhen, outcomeLabel, type PersonNames } from '../../lib/step-records';

interface StepConflictProps {
  step: Step;
  answer: ResilientSave<StepAnswerVars, VisitDetail>;
  names: PersonNames;
}

function Inputs({ inputs }: { inputs: Record<string, string> }) {
  const entries = Object.entries(inputs);
  if (entries.length === 0) return null;
  return (
    <ul className="list-disc pl-6">
      {entries.map(([key, value]) => (
        <li key={key}>
          {key.replaceAll('_', ' ')}: {value}
        </li>
      ))}
    </ul>
  );
}

/** What an answer says, in the step's own words. */
function sentAnswer(step: Step, body: StepAnswerVars['body']) {
  if (body.confirmed) return <p>Every point confirmed.</p>;
  return (
    <>
      <p className="font-semibold">{body.outcome ? outcomeLabel(step, body.outcome) : 'Judge the step from the readings as saved'}</p>
      <Inputs inputs={body.inputs ?? {}} />
    </>
  );
}

function storedAnswer(step: Step, result: StepResultRecord | null, names: PersonNames) {
  if (!result) return <p>No answer: it was taken back.</p>;
  return (
    <>
      <p className="font-semibold">{step.kind === 'safety_gate' ? 'Every point confirmed.' : outcomeLabel(step, result.outcome)}</p>
      <Inputs inputs={answerInputs(result)} />
      <p className="text-base text-ink-muted">
        Saved by {names(result.createdBy)} on {formatWhen(result.createdAt)}.
      </p>
    </>
  );
}

/**
 * Shown when this step was answered on another tab or device after this screen loaded: the answer
 * sent from here beside the one on the server. "Keep mine" sends it again against the server's
 * answer (which stays in the history); "Use the server's" leaves the server's answer standing.
 */
export function StepConflict({ step, answer, names }: StepConflictProps) {
  const queryClient = useQueryClient();
  if (!answer.isRejected || !isStaleVersion(answer.error) || !answer.variables) return null;
  const sent = answer.variables;
  const current = answer.error.current as StaleVersionCurrent;
  const onServer = current.stepResult ?? null;
  return (
    <ConflictDialog
      title="This step was answered on another device"
      explanation={
        <p>
          “{step.title}” was answered on another tab or device after this screen loaded. Your answer is not saved yet. Choose which one stands; the other stays in
          the step’s history.
        </p>
      }
      yours={sentAnswer(step, sent.body)}
      theirs={storedAnswer(step, onServer, names)}
      keepMineLabel="Keep mine"
      takeTheirsLabel="Use the server’s"
      busy={answer.isSaving}
      onKeepMine={() => answer.save({ stepId: sent.stepId, body: { ...sent.body, id: crypto.randomUUID(), replaces: onServer?.id ?? null } })}
      onTakeTheirs={() => {
        queryClient.setQueryData(visitKeys.detail(current.visit.id), current.visit);
        answer.reset();
      }}
    />
  );
}
