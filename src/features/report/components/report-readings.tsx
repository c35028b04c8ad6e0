import { VerdictMark } from '@/components/ui/verdict-mark';
import type { ReportView } from '@shared/schemas/report-view';
import { ReportSection } from './report-section';
import { ScrollRegion } from '@/components/ui/scroll-region';

export function ReportReadings({ report }: { report: ReportView }) {
  return (
    <ReportSection title="Readings">
      {report.readings.length === 0 ? (
        <p className="text-lg text-ink-muted">No readings were taken on the path this visit followed.</p>
      ) : (
        <ScrollRegion label="Readings table">
          <table className="w-full min-w-[44rem] border-collapse text-left text-lg">
            <thead>
              <tr className="border-b-2 border-ink text-base text-ink-muted">
                <th scope="col" className="py-2 pr-3">Circuit and where</th>
                <th scope="col" className="py-2 pr-3">Entered</th>
                <th scope="col" className="py-2 pr-3">Band</th>
                <th scope="col" className="py-2 pr-3">Verdict</th>
                <th scope="col" className="py-2">Why, and allowances</th>
              </tr>
            </thead>
            <tbody>
              {report.readings.map((r) => (
                <tr key={r.id} className="border-b border-surface-line align-top">
                  <th scope="row" className="py-2 pr-3 font-normal">
                    <span className="font-semibold">{r.circuit}</span>
                    <br />
                    <span className="text-base text-ink-muted">
                      {r.position} · {r.stepTitle}
                    </span>
                  </th>
                  <td className="py-2 pr-3 font-mono">{r.entered}</td>
                  <td className="py-2 pr-3">{r.band ?? 'No band set chosen'}</td>
                  <td className="py-2 pr-3">{r.verdict ? <VerdictMark verdict={r.verdict} /> : r.verdictLabel}</td>
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
      {report.replacedReadings > 0 && (
        <p className="text-base text-ink-muted">
          {report.replacedReadings} reading(s) were typed again during the visit; the table shows the values that stand. The earlier values are kept in the visit’s record.
        </p>
      )}
    </ReportSection>
  );
}
