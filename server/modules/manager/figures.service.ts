import { CAUSE_CATEGORIES, type CauseCategory } from '../../../shared/schemas/reading';
import type { CauseMonth, FiguresQuery, ManagerFigures, RepeatVisitEnd } from '../../../shared/schemas/manager-figures';
import { visitReference } from '../../../shared/format/visit-reference';
import { causeCounts, firstTimeFixCounts, repeatPairs, timeToRepair, type FiguresWindow, type RepeatRow } from './figures.repository';

export const REPEAT_LIST_LIMIT = 200;

/** Today's date in the office's zone, as YYYY-MM-DD. */
export function localDate(at: Date, tz: string): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone: tz, year: 'numeric', month: '2-digit', day: '2-digit' }).format(at);
}

/** Every YYYY-MM from the month of `from` to the month of `to`, so a month without visits shows as zero. */
export function monthsBetween(from: string, to: string): string[] {
  const months: string[] = [];
  let [y, m] = from.slice(0, 7).split('-').map(Number) as [number, number];
  const last = to.slice(0, 7);
  for (let guard = 0; guard < 1200; guard += 1) {
    const month = `${y}-${String(m).padStart(2, '0')}`;
    months.push(month);
    if (month >= last) break;
    m += 1;
    if (m > 12) [y, m] = [y + 1, 1];
  }
  return months;
}

/** With no dates given: the twelve calendar months up to today. */
function resolveWindow(q: FiguresQuery, asOf: Date): FiguresWindow {
  const to = q.to ?? localDate(asOf, q.tz);
  let from = q.from;
  if (!from) {
    const [y, m] = to.split('-').map(Number) as [number, number];
    const start = new Date(Date.UTC(y, m - 1 - 11, 1));
    from = start.toISOString().slice(0, 10);
  }
  return { from, to, windowDays: q.windowDays, tz: q.tz, asOf };
}

const emptyCounts = () => Object.fromEntries(CAUSE_CATEGORIES.map((c) => [c, 0])) as Record<CauseCategory, number>;

function end(r: RepeatRow, which: 'earlier' | 'later'): RepeatVisitEnd {
  const id = r[`${which}_id`];
  return {
    id,
    reference: visitReference(id),
    startedAt: r[`${which}_started_at`].toISOString(),
    status: r[`${which}_status`],
    causeCategory: r[`${which}_cause`],
    technicianName: r[`${which}_technician`],
  };
}

export async function managerFigures(q: FiguresQuery, asOf = new Date()): Promise<ManagerFigures> {
  const w = resolveWindow(q, asOf);
  const [ftf, ttr, causes, repeats] = await Promise.all([firstTimeFixCounts(w), timeToRepair(w), causeCounts(w), repeatPairs(w, REPEAT_LIST_LIMIT + 1)]);

  const byMonth = new Map<string, CauseMonth>(monthsBetween(w.from, w.to).map((month) => [month, { month, counts: emptyCounts(), total: 0 }]));
  for (const row of causes) {
    const month = byMonth.get(row.month);
    if (!month) continue;
    month.counts[row.cause] = row.n;
    month.total += row.n;
  }

  return {
    period: { from: w.from, to: w.to, windowDays: w.windowDays, tz: w.tz, asOf: asOf.toISOString() },
    firstTimeFix: {
      closedVisits: ftf.closed_visits,
      judged: ftf.judged,
      fixedFirstTime: ftf.fixed,
      pending: ftf.closed_visits - ftf.judged,
      rate: ftf.judged > 0 ? ftf.fixed / ftf.judged : null,
    },
    timeToRepair: { visits: ttr.visits, meanMinutes: ttr.mean_minutes, medianMinutes: ttr.median_minutes },
    causeMix: [...byMonth.values()],
    repeatVisits: repeats.slice(0, REPEAT_LIST_LIMIT).map((r) => ({
      press: { id: r.press_id, assetTag: r.asset_tag, siteName: r.site_name, customerName: r.customer_name },
      earlier: end(r, 'earlier'),
      later: end(r, 'later'),
      daysApart: Math.round(r.days_apart * 10) / 10,
    })),
    repeatVisitsTruncated: repeats.length > REPEAT_LIST_LIMIT,
  };
}
