import { z } from 'zod';
import { pageNumber, pageSize, type Page } from './common';
import { calendarDateSchema, isKnownTimeZone } from './dates';
import { idNumber } from './numbers';
import { text } from './text';
import { causeCategorySchema, type CauseCategory } from './reading';
import { visitStatusSchema, type VisitStatus } from './visit';

// The manager's table of all visits: one query shape for the screen, the CSV export and the
// review queue, so the export always holds exactly the rows the filters show.

/** Columns the table may sort by; the server maps each to a fixed SQL expression. */
export const VISIT_TABLE_SORTS = ['reference', 'startedAt', 'closedAt', 'status', 'customer', 'site', 'press', 'technician', 'cause', 'repairMinutes'] as const;
export type VisitTableSort = (typeof VISIT_TABLE_SORTS)[number];
export const VISIT_TABLE_MAX_PAGE_SIZE = 100;

/**
 * An IANA time zone such as Europe/Berlin: day and month boundaries are the office's, not the server's.
 * The browser's list and the database's list differ a little; the server also checks the database's.
 */
export const timeZoneSchema = z
  .string()
  .max(64)
  .regex(/^[A-Za-z0-9_+\-/]+$/, 'Use a time zone name such as Europe/Berlin')
  .refine(isKnownTimeZone, 'Unknown time zone');

const id = idNumber();
/** `status=closed,returned` in the address: one parameter, comma-separated. */
const statusList = z
  .string()
  .transform((s) => s.split(',').map((part) => part.trim()).filter(Boolean))
  .pipe(z.array(visitStatusSchema).max(5));

const filterShape = {
  status: statusList.optional(),
  customerId: id.optional(),
  siteId: id.optional(),
  pressId: id.optional(),
  technicianId: id.optional(),
  cause: causeCategorySchema.optional(),
  /** Visit start date range, inclusive, in the office's time zone. */
  from: calendarDateSchema.optional(),
  to: calendarDateSchema.optional(),
  q: text({ max: 100 }).optional(),
  tz: timeZoneSchema.default('UTC'),
};

const datesInOrder = (v: { from?: string; to?: string }) => !v.from || !v.to || v.from <= v.to;
const datesMessage = { message: 'The "from" date must be on or before the "to" date', path: ['to'] };

export const visitTableFilterSchema = z.object(filterShape).refine(datesInOrder, datesMessage);
export type VisitTableFilter = z.infer<typeof visitTableFilterSchema>;

export const visitTableQuerySchema = z
  .object({
    ...filterShape,
    sort: z.enum(VISIT_TABLE_SORTS, 'Sort by one of the table columns').default('startedAt'),
    dir: z.enum(['asc', 'desc']).default('desc'),
    page: pageNumber.default(1),
    pageSize: pageSize(VISIT_TABLE_MAX_PAGE_SIZE).default(25),
  })
  .refine(datesInOrder, datesMessage);
export type VisitTableQuery = z.infer<typeof visitTableQuerySchema>;

export interface VisitTableRow {
  id: number;
  reference: string;
  status: VisitStatus;
  startedAt: string | null;
  closedAt: string | null;
  faultDisplayed: string;
  causeCategory: CauseCategory | null;
  customer: { id: number; name: string };
  site: { id: number; name: string };
  press: { id: number; assetTag: string; model: string };
  technician: { id: number; name: string };
  labourMinutes: number | null;
  travelMinutes: number | null;
  /** closedAt − startedAt in whole minutes; null until the visit is closed. */
  repairMinutes: number | null;
  /** Current readings judged out of band, open or short. */
  failedReadings: number;
  nearEdgeReadings: number;
}

export interface VisitTablePage extends Page<VisitTableRow> {
  sort: VisitTableSort;
  dir: 'asc' | 'desc';
}

/** People who may be assigned visits, for the technician filter. */
export interface TechnicianOption {
  id: number;
  name: string;
  active: boolean;
}
