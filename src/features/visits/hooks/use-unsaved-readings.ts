import { useEffect } from 'react';
import type { MeasureStep } from '@shared/schemas/procedure';
import { clearDraft, loadDraft, saveDraft } from '@/lib/device-drafts';

// One record per visit on the device: "<step id>:<reading key>" → the text typed and not saved yet.
type Unsaved = Record<string, string>;
const entryKey = (step: MeasureStep, readingKey: string) => `${step.id}:${readingKey}`;

/** The step's fields as saved, with any text kept on the device that differs from what is saved. */
export function restoreUnsaved(draftKey: string | undefined, step: MeasureStep, saved: Record<string, string>): { drafts: Record<string, string>; restoredAt: string | null } {
  const kept = draftKey ? loadDraft<Unsaved>(draftKey) : null;
  if (!kept) return { drafts: saved, restoredAt: null };
  const drafts = { ...saved };
  let restored = false;
  for (const spec of step.readings) {
    const text = kept.value[entryKey(step, spec.key)];
    if (text !== undefined && text.trim() !== '' && text !== saved[spec.key]) {
      drafts[spec.key] = text;
      restored = true;
    }
  }
  return { drafts, restoredAt: restored ? kept.savedAt : null };
}

/**
 * Keeps this step's typed-but-unsaved readings on the device, and forgets each one once the server
 * has the same value (saved) or the field is emptied. Other steps' entries are left alone.
 */
export function useKeepUnsaved(draftKey: string | undefined, step: MeasureStep, drafts: Record<string, string>, saved: Record<string, string>): void {
  const signature = JSON.stringify([drafts, saved]);
  useEffect(() => {
    if (!draftKey) return;
    const [typed, onServer] = JSON.parse(signature) as [Record<string, string>, Record<string, string>];
    const before = loadDraft<Unsaved>(draftKey)?.value ?? {};
    const after: Unsaved = { ...before };
    for (const spec of step.readings) {
      const key = entryKey(step, spec.key);
      const text = typed[spec.key] ?? '';
      if (text.trim() !== '' && text !== onServer[spec.key]) after[key] = text;
      else delete after[key];
    }
    if (JSON.stringify(after) === JSON.stringify(before)) return;
    if (Object.keys(after).length === 0) clearDraft(draftKey);
    else saveDraft(draftKey, after);
  }, [draftKey, step, signature]);
}
