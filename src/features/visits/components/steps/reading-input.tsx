import { FieldError } from '@/components/ui/field-error';
import { useEffect, useEffectEvent, useId, useRef, useState, type KeyboardEvent } from 'react';
import { judgeEntry, type EntryContext, type EntryJudgement } from '@shared/domain/judge-entry';
import { entryQuestion, parseEntry, type EntryQuestion } from '@shared/domain/parse-entry';
import type { BandSetValues } from '@shared/schemas/band-set';
import type { ReadingSpec } from '@shared/schemas/procedure';
import type { ReadingRecord, StaleVersionCurrent } from '@shared/schemas/visit-detail';
import { Button } from '@/components/ui/button';
import { TextInput } from '@/components/ui/text-input';
import { VerdictMark } from '@/components/ui/verdict-mark';
import { isApiError, isStaleVersion } from '@/lib/api-error';
import { useSaveReading } from '../../hooks/use-save-reading';
import { conditionsKey, storedConditions, type ReadingConditions } from '../../lib/reading-conditions';
import { SaveStatusBanner } from '../save-status-banner';
import { BandGauge } from './band-gauge';
import { ReadingConflict } from './reading-conflict';

const UNIT_CHIPS = { resistance: ['Ω', 'kΩ', 'MΩ'], ac_voltage: ['V', 'mV'] } as const;
const POSITION_WORDS = { control_end: 'at the control end', sensor_end: 'at the sensor end' } as const;

interface ReadingInputProps {
  visitId: number;
  stepId: string;
  spec: ReadingSpec;
  draft: string;
  onDraftChange: (text: string) => void;
  /** The visit's pinned band values; null until the sensor generation is known. */
  bands: BandSetValues | null;
  context: EntryContext;
  conditions: ReadingConditions;
  stored: ReadingRecord | undefined;
  /** Bumped when the person asks to save every reading again with new temperature / cable. */
  resaveRound: number;
  disabled: boolean;
}

/** Replaces any unit on the typed number with the chosen one: "89.3" + kΩ → "89.3 kΩ". */
function withUnit(draft: string, unit: string): string {
  const number = /^\s*((?:\d+(?:\.\d*)?|\.\d+))/.exec(draft)?.[1];
  return number ? `${number} ${unit}` : draft;
}

/**
 * One meter reading: typed as the meter shows it, judged on the tablet as it is typed, saved on
 * Enter or when the field is left; once saved, the server's verdict is the one shown.
 */
export function ReadingInput(props: ReadingInputProps) {
  const { visitId, stepId, spec, draft, onDraftChange, bands, context, conditions, stored, resaveRound, disabled } = props;
  const id = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const save = useSaveReading(visitId);
  const [asking, setAsking] = useState<{ text: string; question: EntryQuestion } | null>(null);
  const entered = draft.trim();
  const parsed = entered ? parseEntry(entered, spec.quantity) : null;
  const client: EntryJudgement | null =
    entered && bands ? judgeEntry({ quantity: spec.quantity, circuit: spec.circuit, position: spec.position, entered, ...conditions }, bands, context) : null;
  const serverError = save.isRejected && isApiError(save.error) ? save.error.fields.entered : undefined;
  const parseError = parsed && !parsed.ok ? parsed.error : undefined;
  const error = parseError ?? serverError;
  const savedMatches = stored !== undefined && stored.entered === entered && conditionsKey(storedConditions(stored)) === conditionsKey(conditions);

  /** Saves the entry, or returns the question to ask first (a lone 1, or a winding below 1 Ω). */
  const commit = (text = entered, confirmed = false): EntryQuestion | null => {
    if (disabled || !text || !parseEntry(text, spec.quantity).ok) return null;
    // A conflict with another device's save waits for the person's choice in its dialog (leaving the field must not decide it).
    if (save.isRejected && isStaleVersion(save.error)) return null;
    if (stored && stored.entered === text && conditionsKey(storedConditions(stored)) === conditionsKey(conditions)) return null;
    // The same value already on its way (sending, retrying, or waiting for a sign-in) is not sent twice.
    const pending = save.inFlight() ?? (save.isWaitingToRetry ? save.variables : undefined);
    if (pending && pending.entered === text && conditionsKey(pending) === conditionsKey(conditions)) return null;
    // A value already saved was answered when it was saved.
    const question = entryQuestion(text, spec.quantity);
    if (question && !confirmed && stored?.entered !== text) return question;
    // A new id per value typed: retries of this value reuse it, so the server keeps one copy. `replaces`
    // names the reading this screen shows, so one saved meanwhile elsewhere is not overwritten silently.
    save.save({ id: crypto.randomUUID(), replaces: stored?.id ?? null, stepId, quantity: spec.quantity, circuit: spec.circuit, position: spec.position, entered: text, ...(question ? { confirmed: true } : {}), ...conditions });
    return null;
  };
  const commitOrAsk = (text = entered, confirmed = false) => {
    const question = commit(text, confirmed);
    setAsking(question ? { text, question } : null);
  };

  const resave = useEffectEvent(() => {
    commit();
  });
  useEffect(() => {
    if (resaveRound > 0) resave();
  }, [resaveRound]);

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    if (event.key === 'Enter') {
      event.preventDefault();
      commitOrAsk();
    }
  };

  const errorId = `${id}-error`;
  const verdictId = `${id}-verdict`;
  const keepFocus = (event: { preventDefault: () => void }) => event.preventDefault();

  return (
    <div className="space-y-3 rounded-lg border border-surface-line bg-surface-raised p-4">
      <label htmlFor={`${id}-input`} className="block text-lg font-semibold text-ink">
        {spec.label} <span className="font-normal text-ink-muted">{POSITION_WORDS[spec.position]}</span>
      </label>
      <div className="flex flex-wrap items-center gap-2">
        <TextInput
          ref={inputRef}
          id={`${id}-input`}
          inputMode="decimal"
          autoComplete="off"
          autoCapitalize="none"
          spellCheck={false}
          enterKeyHint="done"
          className="max-w-[14rem] text-xl font-semibold"
          value={draft}
          disabled={disabled}
          onChange={(event) => {
            setAsking(null);
            onDraftChange(event.target.value);
          }}
          onBlur={() => commitOrAsk()}
          onKeyDown={onKeyDown}
          aria-invalid={error ? true : undefined}
          aria-describedby={[error ? errorId : '', verdictId].filter(Boolean).join(' ')}
        />
        {spec.quantity === 'resistance' && (
          <Button
            variant="secondary"
            disabled={disabled}
            onPointerDown={keepFocus}
            onClick={() => {
              onDraftChange('OL');
              commitOrAsk('OL');
            }}
          >
            OL
          </Button>
        )}
        {UNIT_CHIPS[spec.quantity].map((unit) => (
          <Button
            key={unit}
            variant="secondary"
            disabled={disabled || !entered}
            aria-label={`Unit ${unit}`}
            onPointerDown={keepFocus}
            onMouseDown={keepFocus}
            onClick={() => {
              onDraftChange(withUnit(draft, unit));
              inputRef.current?.focus();
            }}
          >
            {unit}
          </Button>
        ))}
      </div>
      {asking && asking.text === entered && (
        <EntryQuestionPanel
          question={asking.question}
          quantity={spec.quantity}
          onOverRange={() => {
            onDraftChange('OL');
            commitOrAsk('OL');
          }}
          onConfirm={() => commitOrAsk(asking.text, true)}
          onCorrect={() => {
            setAsking(null);
            inputRef.current?.focus();
          }}
        />
      )}
      <FieldError id={errorId} message={error} />
      <div id={verdictId} aria-live="polite" className="space-y-2">
        <ReadingVerdict client={client} stored={savedMatches ? stored : undefined} saving={save.isSaving} hasBands={bands !== null} entered={entered} parseOk={!parseError} />
      </div>
      {client?.status === 'judged' && bands && (
        <BandGauge
          judgement={savedMatches && isJudged(stored?.judgement) ? stored.judgement : client}
          quantity={spec.quantity}
          circuit={spec.circuit}
          bands={bands}
        />
      )}
      {client?.status === 'judged' && client.notes.length > 0 && (
        <ul className="list-disc space-y-1 pl-6 text-base text-ink-muted">
          {client.notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      )}
      <SaveStatusBanner save={save} what={`the reading “${save.variables?.entered ?? entered}”`} />
      {save.isRejected && isStaleVersion(save.error) && save.variables && (
        <ReadingConflict
          label={`${spec.label} ${POSITION_WORDS[spec.position]}`}
          sent={save.variables.entered}
          onServer={(save.error.current as StaleVersionCurrent).reading ?? null}
          busy={save.isSaving}
          onKeepMine={(onServer) => save.save({ ...save.variables!, id: crypto.randomUUID(), replaces: onServer?.id ?? null })}
          onTakeTheirs={(onServer) => {
            onDraftChange(onServer?.entered ?? '');
            save.reset();
          }}
        />
      )}
    </div>
  );
}

interface EntryQuestionPanelProps {
  question: EntryQuestion;
  quantity: ReadingSpec['quantity'];
  onOverRange: () => void;
  onConfirm: () => void;
  onCorrect: () => void;
}

/** Asks what an ambiguous entry meant before it is saved: over range, or a prefix slip. */
function EntryQuestionPanel({ question, quantity, onOverRange, onConfirm, onCorrect }: EntryQuestionPanelProps) {
  const unit = quantity === 'resistance' ? 'Ω' : 'V';
  return (
    <div role="group" aria-label="Check this reading before it is saved" className="space-y-3 rounded-lg border-2 border-caution bg-caution-soft p-3">
      <p className="text-lg font-medium text-ink">{question.question}</p>
      <div className="flex flex-wrap gap-2">
        {question.kind === 'lone_one' ? (
          <>
            <Button onClick={onOverRange}>Over range: save OL</Button>
            <Button variant="secondary" onClick={onConfirm}>
              It really reads 1 {unit}
            </Button>
          </>
        ) : (
          <>
            <Button variant="secondary" onClick={onCorrect}>
              Correct it
            </Button>
            <Button variant="secondary" onClick={onConfirm}>
              Yes, save it as typed
            </Button>
          </>
        )}
      </div>
    </div>
  );
}

const isJudged = (j: unknown): j is Extract<EntryJudgement, { status: 'judged' }> =>
  typeof j === 'object' && j !== null && (j as { status?: unknown }).status === 'judged' && 'figures' in j;

interface ReadingVerdictProps {
  client: EntryJudgement | null;
  stored: ReadingRecord | undefined;
  saving: boolean;
  hasBands: boolean;
  entered: string;
  parseOk: boolean;
}

/** The server's stored verdict once saved (it counts); before that, the tablet's own. */
function ReadingVerdict({ client, stored, saving, hasBands, entered, parseOk }: ReadingVerdictProps) {
  if (!entered || !parseOk) return null;
  if (stored) {
    const clientVerdict = client?.status === 'judged' ? client.verdict : null;
    return (
      <>
        <p className="flex flex-wrap items-center gap-2 text-lg text-ink">
          <span className="font-semibold">Saved.</span>
          {stored.verdict ? <VerdictMark verdict={stored.verdict} /> : <span className="font-semibold">Not judged yet</span>}
          <span>{stored.reason}</span>
        </p>
        {stored.verdict && clientVerdict && clientVerdict !== stored.verdict && (
          <p className="text-base text-ink-muted">The server judged this reading differently from the tablet; the saved verdict above is the one that counts.</p>
        )}
      </>
    );
  }
  if (!hasBands) {
    return <p className="text-base text-ink-muted">Not judged yet: choose the sensor generation so the reading can be judged.</p>;
  }
  if (!client || client.status === 'error') return null;
  if (client.status === 'awaiting') return <p className="text-base text-ink-muted">{client.reason}</p>;
  return (
    <p className="flex flex-wrap items-center gap-2 text-lg text-ink">
      <VerdictMark verdict={client.verdict} />
      <span>{client.reason}</span>
      <span className="text-base text-ink-muted">{saving ? 'Saving…' : 'Not saved yet — saved when you press Enter or leave the field.'}</span>
    </p>
  );
}
