import { UniqueConstraintError } from 'sequelize';

/** Thrown inside a save's transaction when its client id turned up meanwhile (the first try committed). */
export class SavedMeanwhile extends Error {
  constructor() {
    super('saved by an earlier try meanwhile');
    this.name = 'SavedMeanwhile';
  }
}

/**
 * Saves a row under a client-made id once. `stored` answers a retry with what the first try
 * stored (or null); `save` stores it. Two tries at once: the second either waits for the visit's
 * row lock and finds the first try's row (SavedMeanwhile), or meets it in the unique index; both
 * answer with the stored row, never a 500.
 */
export async function saveOnce<T>(stored: () => Promise<T | null>, save: () => Promise<T>): Promise<T> {
  const earlier = await stored();
  if (earlier !== null) return earlier;
  try {
    return await save();
  } catch (err) {
    if (!(err instanceof SavedMeanwhile || err instanceof UniqueConstraintError)) throw err;
    const now = await stored();
    if (now === null) throw err;
    return now;
  }
}
