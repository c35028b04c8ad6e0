import { formatSi } from '@shared/domain/format-quantity';
import type { BandSetValues } from '@shared/schemas/band-set';
import { CIRCUIT_LEADS } from '@shared/schemas/reading';
import type { ReadingRecord, VisitDetail } from '@shared/schemas/visit-detail';
import { VerdictMark } from '@/components/ui/verdict-mark';
import { RecordSection } from './record-section';
import { ScrollRegion } from '@/components/ui/scroll-region';

const WHERE = { control_end: 'Control end', sensor_end: 'Sensor end' } as const;
const QUANTITY = { resistance: 'resistance', ac_voltage: 'AC voltage' } as const;

/** The band the reading was judged against, in words, from the band set the visit pinned. */
function bandText(r: ReadingRecord, bands: BandSetValues | undefined): string {
  if (!bands) return 'No band set pinned';
  if (r.quantity === 'resistance') {
    const w = bands.windings[r.circuit];
    return `${formatSi(w.nominal, 'resistance')} ±${w.inBandPercent} % (near edge ±${w.nearEdgePercent} %) at ${bands.referenceTemperatureC} °C`;
  }
  const range = r.circuit === 'rotor' ? bands.excitation : bands.statorOutputMagnitude;
  const what = r.circuit === 'rotor' ? '' : 'pair magnitude ';
  return `${what}${formatSi(range.min, 'ac_voltage')}–${formatSi(range.max, 'ac_voltage')} (near edge ±${range.nearEdgePercent} %)`;
}

function judgedValue(r: ReadingRecord): string {
  const figures = (r.judgement as { figures?: { atReference?: number | null; judged?: number | null } }).figures;
  const value = r.quantity === 'resistance' ? figures?.atReference : figures?.judged;
  return typeof value === 'number' ? formatSi(value, r.quantity) : '—';
}

/** Every current reading with the server's verdict, and the band it was judged by (the visit's pinned version). */
export function RecordReadings({ visit }: { visit: VisitDetail }) {
  const current = visit.readings.filter((r) => !r.supersededAt);
  const replaced = visit.readings.length - current.length;
  const bands = visit.bandSet?.bands;
  const stepTitle = (id: string) => visit.procedure.definition.steps.find((s) => s.id === id)?.title ?? id;
  return (
    <RecordSection title="Readings" aside={visit.bandSet && <p className="text-base text-ink-muted">Judged against {visit.bandSet.generation} v{visit.bandSet.version}</p>}>
      {current.length === 0 ? (
        <p className="text-lg text-ink-muted">No readings were taken on this visit.</p>
      ) : (
        <ScrollRegion label="Readings table">
          <table className="w-full min-w-[56rem] text-left text-lg">
            <caption className="sr-only">Readings of {visit.reference} with verdicts and bands</caption>
            <thead className="border-b-2 border-surface-line text-base text-ink-muted">
              <tr>
                <th scope="col" className="py-2 pr-3">Step</th>
                <th scope="col" className="py-2 pr-3">Reading</th>
                <th scope="col" className="py-2 pr-3">Typed</th>
                <th scope="col" className="py-2 pr-3">Judged value</th>
                <th scope="col" className="py-2 pr-3">Band</th>
                <th scope="col" className="py-2 pr-3">Verdict</th>
              </tr>
            </thead>
            <tbody>
              {current.map((r) => (
                <tr key={r.id} className="border-b border-surface-line align-top">
                  <td className="py-2 pr-3 text-base">{stepTitle(r.stepId)}</td>
                  <td className="py-2 pr-3">
                    {CIRCUIT_LEADS[r.circuit]} {QUANTITY[r.quantity]}
                    <span className="block text-base text-ink-muted">{WHERE[r.position]}</span>
                  </td>
                  <td className="py-2 pr-3 font-mono">{r.entered}</td>
                  <td className="py-2 pr-3">{judgedValue(r)}</td>
                  <td className="py-2 pr-3 text-base">{bandText(r, bands)}</td>
                  <td className="py-2 pr-3">
                    {r.verdict ? <VerdictMark verdict={r.verdict} /> : <span className="text-ink-muted">Not judged</span>}
                    <span className="mt-1 block text-base text-ink-muted">{r.reason}</span>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      )}
      {replaced > 0 && <p className="text-base text-ink-muted">{replaced} earlier entr{replaced === 1 ? 'y was' : 'ies were'} replaced by a new reading and kept in the history.</p>}
    </RecordSection>
  );
}
