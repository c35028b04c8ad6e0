import type { z } from 'zod';

/**
 * Messages for what the shared schema leaves to zod's defaults: numbers that are not numbers yet.
 * The schema's own messages win; these only fill the gaps, and say what to type.
 */
export const closeOutErrorMap: z.core.$ZodErrorMap = (issue) => {
  if (issue.code !== 'invalid_type' || issue.expected !== 'number') return undefined;
  const field = issue.path?.at(-1);
  if (field === 'labourMinutes') return 'Enter the labour time in whole minutes, e.g. 90';
  if (field === 'travelMinutes') return 'Enter the travel time in whole minutes, e.g. 45 (0 if none)';
  if (field === 'stoppingTimeMs') return 'Enter the stopping time in milliseconds, e.g. 180, or leave it empty';
  if (field === 'quantity') return 'Enter the quantity as a whole number, e.g. 1';
  if (field === 'strokesPerMinute') return 'Enter the strokes per minute, e.g. 40';
  if (field === 'engagingPoints') return 'Enter the number of engaging points of the clutch, e.g. 4';
  return 'Enter a number';
};
