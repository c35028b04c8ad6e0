import { useState } from 'react';
import { FIRMWARE_UNREADABLE, FIRMWARE_UNREADABLE_LABEL, FIRMWARE_VERSION_HINT, isFirmwareVersionAnswer } from '@shared/schemas/firmware-version';
import type { Step } from '@shared/schemas/procedure';
import type { StepResultRecord, VisitDetail } from '@shared/schemas/visit-detail';
import { Button } from '@/components/ui/button';
import { CheckboxCard } from '@/components/ui/checkbox-card';
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
  const [controlUnreadable, setControlUnreadable] = useState(given[CONTROL] === FIRMWARE_UNREADABLE);
  const [monitorUnreadable, setMonitorUnreadable] = useState(given[MONITOR] === FIRMWARE_UNREADABLE);
  const [missing, setMissing] = useState<Record<string, string>>({});
  const errors = { ...(answer.isRejected ? serverFieldErrors(answer.error, 'inputs.') : {}), ...missing };
  const label = (key: string, fallback: string) => step.inputs?.find((i) => i.key === key)?.label ?? fallback;
  const verdict = result?.outcome ? VERDICTS[result.outcome] : undefined;

  const check = () => {
    const values = { [CONTROL]: controlUnreadable ? FIRMWARE_UNREADABLE : control.trim(), [MONITOR]: monitorUnreadable ? FIRMWARE_UNREADABLE : monitor.trim() };
    const blank: Record<string, string> = {};
    for (const [key, unit] of [[CONTROL, 'press control'], [MONITOR, 'monitor module']] as const) {
      if (!values[key]) blank[key] = `Type the ${unit} firmware version as displayed, or tick "${FIRMWARE_UNREADABLE_LABEL}".`;
      else if (!isFirmwareVersionAnswer(values[key])) blank[key] = FIRMWARE_VERSION_HINT;
    }
    setMissing(blank);
    if (Object.keys(blank).length > 0) return;
    answer.save({ stepId: step.id, body: { id: crypto.randomUUID(), inputs: values } });
  };

  const versionField = (key: string, fallback: string, value: string, setValue: (v: string) => void, unreadable: boolean, setUnreadable: (v: boolean) => void) => (
    <div className="space-y-2">
      <Field label={label(key, fallback)} error={errors[key]}>
        <TextInput inputMode="decimal" spellCheck={false} maxLength={40} value={unreadable ? '' : value} disabled={!editable || unreadable} onChange={(e) => setValue(e.target.value)} />
      </Field>
      <CheckboxCard label={FIRMWARE_UNREADABLE_LABEL} checked={unreadable} disabled={!editable} onChange={(e) => setUnreadable(e.target.checked)} />
    </div>
  );

  return (
    <div className="space-y-5">
      <div className="grid gap-4 sm:grid-cols-2">
        {versionField(CONTROL, 'Press control firmware', control, setControl, controlUnreadable, setControlUnreadable)}
        {versionField(MONITOR, 'Monitor module firmware', monitor, setMonitor, monitorUnreadable, setMonitorUnreadable)}
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
