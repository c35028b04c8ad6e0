import { formatMinutes } from '@shared/format/minutes';
import { firmwareLine, recommendedByProcedure, RECORD_LABELS as L, RECORD_SECTIONS as S, RECORD_WORDS as W } from '@shared/record/record-wording';
import type { VisitRecord } from '@shared/schemas/visit-record';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { Section } from '@/components/ui/section';
import { Facts } from './facts';

/** Firmware as found and as left, the work with its parts and time, and the recommendations. */
export function RecordWork({ record }: { record: VisitRecord }) {
  const { work, times, parts } = record;
  return (
    <>
      <Section title={S.firmware}>
        <Facts
          rows={[
            [L.pressControl, firmwareLine(work.firmware.controlFound, work.firmware.controlLeft)],
            [L.monitorModule, firmwareLine(work.firmware.monitorFound, work.firmware.monitorLeft)],
          ]}
        />
      </Section>
      <Section title={S.work}>
        <Facts
          rows={[
            [L.actionsTaken, <span className="whitespace-pre-line">{work.actionsTaken ?? W.notRecorded}</span>],
            [L.labour, formatMinutes(times.labourMinutes)],
            [L.travel, formatMinutes(times.travelMinutes)],
          ]}
        />
        {parts.length === 0 ? (
          <p className="text-lg text-ink-muted">{W.noParts}</p>
        ) : (
          <ScrollRegion label={S.parts}>
            <table className="w-full min-w-[36rem] border-collapse text-left text-lg">
              <caption className="pb-2 text-left font-semibold">{S.parts}</caption>
              <thead>
                <tr className="border-b-2 border-ink text-base text-ink-muted">
                  <th scope="col" className="py-2 pr-3">Part number</th>
                  <th scope="col" className="py-2 pr-3">Description</th>
                  <th scope="col" className="py-2 pr-3">Qty</th>
                  <th scope="col" className="py-2 pr-3">Serial removed</th>
                  <th scope="col" className="py-2">Serial fitted</th>
                </tr>
              </thead>
              <tbody>
                {parts.map((p) => (
                  <tr key={p.id} className="border-b border-surface-line">
                    <td className="py-2 pr-3 font-mono">{p.partNumber}</td>
                    <td className="py-2 pr-3">{p.description || W.notRecorded}</td>
                    <td className="py-2 pr-3">{p.quantity}</td>
                    <td className="py-2 pr-3 font-mono">{p.serialRemoved ?? W.notRecorded}</td>
                    <td className="py-2 font-mono">{p.serialFitted ?? W.notRecorded}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollRegion>
        )}
      </Section>
      <Section title={S.recommendations}>
        <p className="whitespace-pre-line text-lg">{work.recommendations ?? W.noRecommendations}</p>
        {record.path.finding && <p className="text-lg text-ink-muted">{recommendedByProcedure(record.path.finding.recommendedAction)}</p>}
      </Section>
    </>
  );
}
