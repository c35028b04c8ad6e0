import type { z } from 'zod';

/**
 * Plain-language messages for the generic number and text issues of the shared schemas
 * (their own refinement messages are kept as written). Passed to zodResolver as parse options.
 */
export const FORM_MESSAGES: { error: z.core.$ZodErrorMap } = {
  error: (issue) => {
    if (issue.code === 'invalid_type' && issue.expected === 'number') return 'Enter a number';
    if (issue.code === 'too_small' && issue.origin === 'number') {
      return issue.inclusive ? `Enter ${String(issue.minimum)} or more` : `Enter a number above ${String(issue.minimum)}`;
    }
    if (issue.code === 'too_big' && issue.origin === 'number') return `Enter ${String(issue.maximum)} or less`;
    if (issue.code === 'too_small' && issue.origin === 'string') return 'Fill this in';
    if (issue.code === 'too_big' && issue.origin === 'string') return `Keep it to ${String(issue.maximum)} characters`;
    return undefined;
  },
};
