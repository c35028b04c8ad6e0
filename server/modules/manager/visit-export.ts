import { VISIT_STATUS_LABELS } from '../../../shared/format/labels';
import { CAUSE_LABELS } from '../../../shared/schemas/visit';
import type { VisitTableFilter } from '../../../shared/schemas/visit-table';
import { csvRecord, UTF8_BOM } from './csv';
import { visitBatches } from './visit-table.repository';


export function exportHeader(tz: string): string[] {
  return [
    'Visit',
    'Status',
    `Started (${tz})`,
    `Closed (${tz})`,
    'Customer',
    'Site',
    'Press',
    'Press model',
    'Technician',
    'Cause',
    'Fault displayed',
    'Time to repair (min)',
    'Labour (min)',
    'Travel (min)',
    'Failed readings',
    'Near-edge readings',
  ];
}

/**
 * The CSV export of the filtered visits, produced batch by batch for the route to write as it goes.
 * The first chunk (header and first batch) comes only after the first query has answered.
 */
export async function* visitCsvChunks(filter: VisitTableFilter): AsyncGenerator<string> {
  let header = UTF8_BOM + csvRecord(exportHeader(filter.tz));
  for await (const batch of visitBatches(filter)) {
    yield header +
      batch
      .map((r) =>
        csvRecord([
          r.reference,
          VISIT_STATUS_LABELS[r.status],
          r.startedLocal,
          r.closedLocal,
          r.customer.name,
          r.site.name,
          r.press.assetTag,
          r.press.model,
          r.technician.name,
          r.causeCategory ? CAUSE_LABELS[r.causeCategory] : '',
          r.faultDisplayed,
          r.repairMinutes,
          r.labourMinutes,
          r.travelMinutes,
          r.failedReadings,
          r.nearEdgeReadings,
        ]),
      )
      .join('');
    header = '';
  }
  if (header) yield header;
}
