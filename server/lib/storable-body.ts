import type { RequestHandler } from 'express';
import { storageProblem } from '../../shared/schemas/text';
import { AppError } from './errors';

// The shared text types refuse NUL and lone surrogates field by field. A few bodies hold JSON the
// schemas do not spell out (a procedure definition is checked by its own validator and stored as
// JSONB), so every parsed JSON body is also walked once: a string PostgreSQL cannot store, as a
// value or as a key, is a 400 naming where it is, before any handler runs.

/** The path of the first string (value or key) in the body that cannot be stored, with the reason. */
export function findUnstorable(body: unknown): { path: string; message: string } | null {
  // Iterative: a body may nest thousands of levels deep.
  const stack: { value: unknown; path: string }[] = [{ value: body, path: '' }];
  while (stack.length) {
    const { value, path } = stack.pop()!;
    if (typeof value === 'string') {
      const message = storageProblem(value);
      if (message) return { path: path || '_', message };
    } else if (Array.isArray(value)) {
      value.forEach((item, i) => stack.push({ value: item, path: path ? `${path}.${i}` : String(i) }));
    } else if (value && typeof value === 'object') {
      for (const [key, item] of Object.entries(value)) {
        const at = path ? `${path}.${key}` : key;
        const keyProblem = storageProblem(key);
        if (keyProblem) return { path: at, message: `This field name cannot be stored. ${keyProblem}` };
        stack.push({ value: item, path: at });
      }
    }
  }
  return null;
}

export const refuseUnstorableText: RequestHandler = (req, _res, next) => {
  const found = req.body === undefined ? null : findUnstorable(req.body);
  if (found) {
    next(new AppError(400, 'invalid_input', 'Some fields in the request body need attention.', { [found.path]: found.message }));
    return;
  }
  next();
};
