import { z } from 'zod';
import { calendarDateSchema } from './dates';
import { wholeNumber } from './numbers';
import type { CauseCategory, Circuit, Position, Quantity, Verdict } from './reading';
import type { VisitStatus } from './visit';
import { timeZoneSchema } from './visit-table';

// The service manager's figures and a press's reading history.
// Definitions are written out once, here, and repeated in the SQL that computes them.

export const DEFAULT_REPEAT_WINDOW_DAYS = 30;


export const figuresQuerySchema = z
  .object({
    /** Period of closing dates (repeat visits: of the later visit's start), inclusive, office time zone. */
    from: calendarDateSchema.optional(),
    to: calendarDateSchema.optional(),
    /** N of "no further visit on the same press within N days": the repeat window. */
    windowDays: wholeNumber({ min: 1, max: 365, message: 'The window is a whole number of days', minMessage: 'The window is at least 1 day', maxMessage: 'The window is at most 365 days' }).default(DEFAULT_REPEAT_WINDOW_DAYS),
    tz: timeZoneSchema.default('UTC'),
  })
  .refine((v) => !v.from || !v.to || v.from <= v.to, { message: 'The "from" date must be on or before the "to" date', path: ['to'] });
export type FiguresQuery = z.infer<typeof figuresQuerySchema>;

export interface FirstTimeFix {
  /** Visits closed or approved in the period. */
  closedVisits: number;
  /** Of those, the ones whose outcome is known: their window has passed, or a repeat already came. */
  judged: number;
  fixedFirstTime: number;
  /** Closed too recently to say: the window is still running and no repeat has come yet. */
  pending: number;
  /** fixedFirstTime / judged, 0..1; null when nothing is judged yet. */
  rate: number | null;
}

export interface TimeToRepair {
  visits: number;
  meanMinutes: number | null;
  medianMinutes: number | null;
}

export interface CauseMonth {
  /** YYYY-MM in the office's time zone. */
  month: string;
  counts: Record<CauseCategory, number>;
  total: number;
}

export interface RepeatVisitEnd {
  id: number;
  reference: string;
  startedAt: string;
  status: VisitStatus;
  causeCategory: CauseCategory | null;
  technicianName: string;
}

export interface RepeatVisit {
  press: { id: number; assetTag: string; siteName: string; customerName: string };
  earlier: RepeatVisitEnd;
  later: RepeatVisitEnd;
  /** Days between the two starts, one decimal. */
  daysApart: number;
}

export interface ManagerFigures {
  period: { from: string; to: string; windowDays: number; tz: string; asOf: string };
  firstTimeFix: FirstTimeFix;
  timeToRepair: TimeToRepair;
  causeMix: CauseMonth[];
  repeatVisits: RepeatVisit[];
  /** True when more repeat pairs exist than are listed. */
  repeatVisitsTruncated: boolean;
}

/** Where a reading sits against the band it was judged by: the in-band and near-edge limits. */
export interface BandLimits {
  nominal: number | null;
  inLow: number;
  inHigh: number;
  edgeLow: number;
  edgeHigh: number;
}

export interface PressHistoryPoint {
  visitId: number;
  reference: string;
  startedAt: string;
  entered: string;
  /** The value the band judges: winding resistance at reference temperature, or the stator pair's vector magnitude. */
  judgedValue: number | null;
  isOpen: boolean;
  verdict: Verdict | null;
  reason: string;
  band: BandLimits | null;
  /** The band-set version the visit pinned, e.g. "gen-a v2". */
  bandSetLabel: string | null;
}

export interface PressHistorySeries {
  key: string;
  quantity: Quantity;
  circuit: Circuit | 'stator_pair';
  position: Position;
  label: string;
  unit: 'Ω' | 'V';
  points: PressHistoryPoint[];
}

export interface PressHistory {
  press: { id: number; assetTag: string; model: string; siteName: string; customerName: string; sensorGeneration: string | null };
  visits: Array<{ id: number; reference: string; startedAt: string; status: VisitStatus; causeCategory: CauseCategory | null; bandSetLabel: string | null }>;
  series: PressHistorySeries[];
}

export interface AuditTrailEntry {
  id: number;
  action: string;
  actor: { id: number; name: string } | null;
  detail: Record<string, unknown>;
  createdAt: string;
}
