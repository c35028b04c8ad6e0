import { VISIT_STATUS_LABELS } from '@shared/format/labels';
import { formatMinutes } from '@shared/format/minutes';
import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import { CAUSE_LABELS } from '@shared/schemas/visit';
import type { VisitTableRow } from '@shared/schemas/visit-table';
import { VerdictMark } from '@/components/ui/verdict-mark';


const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const when = (iso: string | null) => (iso ? dateTime.format(new Date(iso)) : '—');

const col = createColumnHelper<VisitTableRow>();

export interface ColumnLinks {
  recordHref: (id: number) => string;
  pressHistoryHref: (pressId: number) => string;
}

/** Column ids are the server's sort keys, so a header click maps straight to `sort=`. */
export function visitColumns({ recordHref, pressHistoryHref }: ColumnLinks) {
  return [
    col.accessor('reference', {
      id: 'reference',
      header: 'Visit',
      sortDescFirst: true,
      cell: (c) => (
        <Link to={recordHref(c.row.original.id)} className="font-semibold text-accent underline underline-offset-4">
          {c.getValue()}
        </Link>
      ),
    }),
    col.accessor('status', { id: 'status', header: 'Status', sortDescFirst: false, cell: (c) => VISIT_STATUS_LABELS[c.getValue()] }),
    col.accessor('startedAt', { id: 'startedAt', header: 'Started', sortDescFirst: true, cell: (c) => when(c.getValue()) }),
    col.accessor('closedAt', { id: 'closedAt', header: 'Closed', sortDescFirst: true, cell: (c) => when(c.getValue()) }),
    col.accessor((r) => r.customer.name, { id: 'customer', header: 'Customer', sortDescFirst: false }),
    col.accessor((r) => r.site.name, { id: 'site', header: 'Site', sortDescFirst: false }),
    col.accessor((r) => r.press.assetTag, {
      id: 'press',
      header: 'Press',
      sortDescFirst: false,
      cell: (c) => (
        <Link to={pressHistoryHref(c.row.original.press.id)} className="text-accent underline underline-offset-4" title={`Reading history of ${c.getValue()}`}>
          {c.getValue()}
        </Link>
      ),
    }),
    col.accessor((r) => r.technician.name, { id: 'technician', header: 'Technician', sortDescFirst: false }),
    col.accessor('causeCategory', { id: 'cause', header: 'Cause', sortDescFirst: false, cell: (c) => (c.getValue() ? CAUSE_LABELS[c.getValue()!] : '—') }),
    col.accessor('repairMinutes', { id: 'repairMinutes', header: 'Time to repair', sortDescFirst: true, cell: (c) => formatMinutes(c.getValue()) }),
    col.display({
      id: 'readings',
      header: 'Readings',
      cell: ({ row: { original: r } }) =>
        r.failedReadings + r.nearEdgeReadings === 0 ? (
          <span className="text-ink-muted">none flagged</span>
        ) : (
          <span className="flex flex-col gap-1">
            {r.failedReadings > 0 && (
              <span className="flex items-center gap-1">
                <VerdictMark verdict="out_of_band" className="px-1.5 py-0.5 text-sm" /> ×{r.failedReadings}
              </span>
            )}
            {r.nearEdgeReadings > 0 && (
              <span className="flex items-center gap-1">
                <VerdictMark verdict="near_edge" className="px-1.5 py-0.5 text-sm" /> ×{r.nearEdgeReadings}
              </span>
            )}
          </span>
        ),
    }),
  ];
}
