import { ScrollRegion } from '@/components/ui/scroll-region';
import type { ReportView } from '@shared/schemas/report-view';
import { formatMinutes } from './report-dates';
import { Facts, ReportSection } from './report-section';

export function ReportWork({ report }: { report: ReportView }) {
  const { firmware: fw } = report;
  return (
    <>
      <ReportSection title="Firmware">
        <Facts
          rows={[
            ['Press control', `as found ${fw.controlFound ?? '—'} · as left ${fw.controlLeft ?? '—'}`],
            ['Monitor module', `as found ${fw.monitorFound ?? '—'} · as left ${fw.monitorLeft ?? '—'}`],
          ]}
        />
      </ReportSection>
      <ReportSection title="Work done">
        <Facts
          rows={[
            ['Actions taken', <span className="whitespace-pre-line">{report.actionsTaken ?? '—'}</span>],
            ['Labour', formatMinutes(report.labourMinutes)],
            ['Travel', formatMinutes(report.travelMinutes)],
          ]}
        />
        {report.parts.length === 0 ? (
          <p className="text-lg text-ink-muted">No parts were used.</p>
        ) : (
          <ScrollRegion label="Parts used">
            <table className="w-full min-w-[36rem] border-collapse text-left text-lg">
              <caption className="pb-2 text-left font-semibold">Parts used</caption>
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
                {report.parts.map((p) => (
                  <tr key={`${p.partNumber}-${p.serialFitted ?? ''}-${p.serialRemoved ?? ''}`} className="border-b border-surface-line">
                    <td className="py-2 pr-3 font-mono">{p.partNumber}</td>
                    <td className="py-2 pr-3">{p.description || '—'}</td>
                    <td className="py-2 pr-3">{p.quantity}</td>
                    <td className="py-2 pr-3">{p.serialRemoved ?? '—'}</td>
                    <td className="py-2">{p.serialFitted ?? '—'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollRegion>
        )}
      </ReportSection>
      <ReportSection title="Recommendations">
        <p className="whitespace-pre-line text-lg">{report.recommendations ?? 'None beyond the finding.'}</p>
        {report.finding && <p className="text-lg text-ink-muted">Recommended by the procedure: {report.finding.recommendedAction}</p>}
      </ReportSection>
    </>
  );
}
