import { z } from 'zod';
import { idNumber, wholeNumber } from './numbers';
import { text } from './text';

/** Paging in an address: whole numbers only (no 1e3, no 0x10). */
export const pageNumber = wholeNumber({ min: 1, max: 100_000, message: 'The page is a whole number from 1 up' });
export const pageSize = (max: number) =>
  wholeNumber({ min: 1, max, message: 'The page size is a whole number from 1 up', maxMessage: `At most ${max} rows per page` });

export const idParamSchema = z.object({ id: idNumber() });
export type IdParam = z.infer<typeof idParamSchema>;

export const pageQuerySchema = z.object({
  q: text({ max: 100 }).optional(),
  page: pageNumber.default(1),
  pageSize: pageSize(100).default(25),
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
  error: { code: string; message: string; fields?: Record<string, string>; requestId?: string; current?: unknown };
}

/** What every stored directory record answers with: its id and two timestamps (ISO 8601). */
export interface StoredRecord {
  id: number;
  createdAt: string;
  updatedAt: string;
}

/**
 * The request schemas of a directory record (customers, sites, presses): the create body, the update
 * body (any part of it) and the list query (paging, search and the record's own filters).
 */
export function directorySchemas<Input extends z.ZodRawShape, Filters extends z.ZodRawShape>(input: z.ZodObject<Input>, filters: Filters) {
  return { input, update: input.partial(), listQuery: pageQuerySchema.extend(filters) };
}
