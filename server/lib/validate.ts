import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';
import { AppError, fieldsFromZod } from './errors';

type Part = 'body' | 'query' | 'params';

const PART_LABEL: Record<Part, string> = { body: 'request body', query: 'query string', params: 'URL' };

/**
 * Parses one part of the request with a shared zod schema. The parsed value is kept on
 * res.locals.valid[part] (Express 5's req.query is read-only), and read back with `valid()`.
 */
export function validate(part: Part, schema: z.ZodType): RequestHandler {
  return (req, res, next) => {
    const parsed = schema.safeParse(req[part] ?? {});
    if (!parsed.success) {
      next(new AppError(400, 'invalid_input', `Some fields in the ${PART_LABEL[part]} need attention.`, fieldsFromZod(parsed.error)));
      return;
    }
    const locals = res.locals as { valid?: Partial<Record<Part, unknown>> };
    locals.valid = { ...locals.valid, [part]: parsed.data };
    next();
  };
}

export function valid<S extends z.ZodType>(req: Request, part: Part, _schema: S): z.infer<S> {
  const locals = req.res?.locals as { valid?: Partial<Record<Part, unknown>> } | undefined;
  const value = locals?.valid?.[part];
  if (value === undefined) throw new Error(`validate('${part}') middleware missing before this handler`);
  return value as z.infer<S>;
}
