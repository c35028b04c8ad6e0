import { useState } from 'react';
import type { Step } from '@shared/schemas/procedure';
import type { StepResultRecord, VisitDetail } from '@shared/schemas/visit-detail';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { cn } from '@/lib/cn';
import type { StepAnswerVars } from '@/api/visits';
import type { ResilientSave } from '../../hooks/use-resilient-save';
import { answerInputs, answerReason } from '../../lib/step-records';
import { SaveStatusBanner } from '../save-status-banner';
import { serverFieldErrors } from '@/lib/apply-server-errors';

const CONTROL = 'press_control_version';
const MONITOR = 'monitor_module_version';

// Shape and words as well as colour: tick for compatible, cross for incompatible, question for unknown.
const VERDICTS: Record<string, { glyph: string; words: string; tone: string }> = {
  compatible: { glyph: '✓', words: 'Compatible', tone: 'bg-verdict-in_band-soft text-verdict-in_band' },
  incompatible: { glyph: '✕', words: 'Incompatible', tone: 'bg-verdict-out_of_band-soft text-verdict-out_of_band' },
  unknown: { glyph: '?', words: 'Unknown pairing', tone: 'bg-verdict-near_edge-soft text-verdict-near_edge' },
};

interface FirmwareStepViewProps {
  visit: VisitDetail;
  step: Extract<Step, { kind: 'firmware' }>;
  result: StepResultRecord | undefined;
  answer: ResilientSave<StepAnswerVars, VisitDetail>;
  editable: boolean;
}

/** Both versions as displayed; the server compares them with the pinned compatibility rules. */
export function FirmwareStepView({ visit, step, result, answer, editable }: FirmwareStepViewProps) {
  const given = answerInputs(result);
  const [control, setControl] = useState(given[CONTROL] ?? visit.controlFirmwareFound ?? '');
  const [monitor, setMonitor] = useState(given[MONITOR] ?? visit.monitorFirmwareFound ?? '');
  const [missing, setMissing] = useState<Record<string, string>>({});
  const errors = { ...(answer.isRejected ? serverFieldErrors(answer.error, 'inputs.') : {}), ...missing };
  const label = (key: string, fallback: string) => step.inputs?.find((i) => i.key === key)?.label ?? fallback;
  const verdict = result?.outcome ? VERDICTS[result.outcome] : undefined;

  const check = () => {
    const blank: Record<string, string> = {};
    if (!control.trim()) blank[CONTROL] = 'Type the press control firmware version as displayed.';
    if (!monitor.trim()) blank[MONITOR] = 'Type the monitor module firmware version as displayed.';
    setMissing(blank);
    if (Object.keys(blank).length > 0) return;
    answer.save({ stepId: step.id, body: { id: crypto.randomUUID(), inputs: { [CONTROL]: control.trim(), [MONITOR]: monitor.trim() } } });
  };

  return (
    <div className="space-y-5">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label={label(CONTROL, 'Press control firmware')} error={errors[CONTROL]}>
          <TextInput inputMode="decimal" value={control} disabled={!editable} onChange={(e) => setControl(e.target.value)} />
        </Field>
        <Field label={label(MONITOR, 'Monitor module firmware')} error={errors[MONITOR]}>
          <TextInput inputMode="decimal" value={monitor} disabled={!editable} onChange={(e) => setMonitor(e.target.value)} />
        </Field>
      </div>
      <SaveStatusBanner save={answer} what="the firmware versions" />
      {editable && (
        <Button size="lg" disabled={answer.isSaving || answer.isWaitingToRetry} onClick={check}>
          {answer.isSaving ? 'Checking…' : result ? 'Check the pairing again' : 'Check the pairing'}
        </Button>
      )}
      {result && (
        <div aria-live="polite" className="space-y-1 rounded-lg border border-surface-line bg-surface-raised p-4">
          <p className={cn('inline-flex items-center gap-2 rounded-md px-3 py-1 text-lg font-semibold', verdict?.tone)}>
            <span aria-hidden="true">{verdict?.glyph}</span>
            {verdict?.words ?? result.outcome}
          </p>
          {answerReason(result) && <p className="text-lg text-ink">{answerReason(result)}</p>}
        </div>
      )}
    </div>
  );
}
