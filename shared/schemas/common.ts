import { z } from 'zod';

export const idParamSchema = z.object({ id: z.coerce.number().int().positive() });
export type IdParam = z.infer<typeof idParamSchema>;

export const pageQuerySchema = z.object({
  q: z.string().trim().max(100).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});
export type PageQuery = z.infer<typeof pageQuerySchema>;

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** The JSON body every error response carries: `message` is written for a person. */
export interface ApiErrorBody {
  error: { code: string; message: string; fields?: Record<string, string>; requestId?: string };
}
