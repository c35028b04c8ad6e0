import { RECORD_SECTIONS as S, RECORD_WORDS as W, replacedReadingsNote } from '@shared/record/record-wording';
import type { VisitRecord } from '@shared/schemas/visit-record';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { VerdictMark } from '@/components/ui/verdict-mark';
import { Section } from '@/components/ui/section';

/** Every reading that stands, with the server's verdict and the band of the pinned band-set version. */
export function RecordReadings({ record }: { record: VisitRecord }) {
  const { items, replaced } = record.readings;
  return (
    <Section title={S.readings} aside={<p className="text-base text-ink-muted">Judged against {record.header.bandSetLine}</p>}>
      {items.length === 0 ? (
        <p className="text-lg text-ink-muted">{W.noReadings}</p>
      ) : (
        <ScrollRegion label="Readings table">
          <table className="w-full min-w-[52rem] border-collapse text-left text-lg">
            <caption className="sr-only">Readings of {record.header.reference} with verdicts and bands</caption>
            <thead>
              <tr className="border-b-2 border-ink text-base text-ink-muted">
                <th scope="col" className="py-2 pr-3">Circuit and where</th>
                <th scope="col" className="py-2 pr-3">Entered</th>
                <th scope="col" className="py-2 pr-3">Judged value</th>
                <th scope="col" className="py-2 pr-3">Band</th>
                <th scope="col" className="py-2 pr-3">Verdict</th>
                <th scope="col" className="py-2">Why, and allowances</th>
              </tr>
            </thead>
            <tbody>
              {items.map((r) => (
                <tr key={r.id} className="border-b border-surface-line align-top">
                  <th scope="row" className="py-2 pr-3 font-normal">
                    <span className="font-semibold">{r.circuitLabel}</span>
                    <br />
                    <span className="text-base text-ink-muted">
                      {r.positionLabel} · {r.quantityLabel} · {r.stepTitle}
                    </span>
                  </th>
                  <td className="py-2 pr-3 font-mono">{r.entered}</td>
                  <td className="py-2 pr-3">{r.judgedValue ?? W.notRecorded}</td>
                  <td className="py-2 pr-3 text-base">{r.band ?? W.noBandSet}</td>
                  <td className="py-2 pr-3">{r.verdict ? <VerdictMark verdict={r.verdict} /> : <span className="text-ink-muted">{r.verdictLabel}</span>}</td>
                  <td className="py-2">
                    <p>{r.reason}</p>
                    {r.temperature && <p className="text-base text-ink-muted">{r.temperature}</p>}
                    {r.cable && <p className="text-base text-ink-muted">{r.cable}</p>}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      )}
      {replaced > 0 && <p className="text-base text-ink-muted">{replacedReadingsNote(replaced)}</p>}
    </Section>
  );
}
