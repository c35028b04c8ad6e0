/**
 * What a person typed and has not saved yet, kept on this device per user and visit so a reload,
 * Back, a closed tab or an ended session does not lose it. Cleared when the save succeeds and
 * when that person signs out. localStorage may be full or off (private mode): then nothing is kept.
 */
const PREFIX = 'crankwise:draft:';

export interface StoredDraft<T> {
  savedAt: string;
  value: T;
}

export const draftKey = (userId: number, visitId: number, kind: 'close-out' | 'readings') => `${PREFIX}${userId}:${visitId}:${kind}`;

export function saveDraft<T>(key: string, value: T): void {
  try {
    localStorage.setItem(key, JSON.stringify({ savedAt: new Date().toISOString(), value } satisfies StoredDraft<T>));
  } catch {
    // Full or unavailable: the draft lives only on the screen, as before.
  }
}

export function loadDraft<T>(key: string): StoredDraft<T> | null {
  try {
    const raw = localStorage.getItem(key);
    if (!raw) return null;
    const parsed = JSON.parse(raw) as Partial<StoredDraft<T>>;
    return typeof parsed.savedAt === 'string' && parsed.value !== undefined ? (parsed as StoredDraft<T>) : null;
  } catch {
    return null;
  }
}

export function clearDraft(key: string): void {
  try {
    localStorage.removeItem(key);
  } catch {
    // Nothing stored, nothing to clear.
  }
}

/** Every draft of one person on this device (at sign-out); other people's drafts stay. */
export function clearUserDrafts(userId: number): void {
  try {
    const mine = `${PREFIX}${userId}:`;
    const keys = Array.from({ length: localStorage.length }, (_, i) => localStorage.key(i)).filter((k): k is string => k !== null && k.startsWith(mine));
    keys.forEach((k) => localStorage.removeItem(k));
  } catch {
    // Unavailable storage holds no drafts.
  }
}
