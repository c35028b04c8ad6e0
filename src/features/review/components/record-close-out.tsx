import type { VisitDetail } from '@shared/schemas/visit-detail';
import { formatDateTime, hoursMinutes } from '../lib/format';
import type { AttachmentDto } from '@shared/schemas/attachment';
import { Fact, RecordSection } from './record-section';

const yes = (v: boolean | undefined) => (v ? 'Confirmed' : 'Not confirmed');

/** What was done, with which parts and how long, the checks before production, and the sign-off. */
export function RecordCloseOut({ visit, signature }: { visit: VisitDetail; signature: AttachmentDto | undefined }) {
  const c = visit.closeOut;
  const rts = c.returnToService;
  return (
    <>
      <RecordSection title="Work and time">
        <dl className="grid gap-4 md:grid-cols-2">
          <Fact term="Actions taken">{c.actionsTaken}</Fact>
          <Fact term="Recommendations">{c.recommendations}</Fact>
          <Fact term="Labour (h:mm)">{c.labourMinutes === null ? null : hoursMinutes(c.labourMinutes)}</Fact>
          <Fact term="Travel (h:mm)">{c.travelMinutes === null ? null : hoursMinutes(c.travelMinutes)}</Fact>
        </dl>
        <h3 className="pt-2 text-xl font-semibold text-ink">Parts used</h3>
        {c.parts.length === 0 ? (
          <p className="text-lg text-ink-muted">No parts were used.</p>
        ) : (
          <table className="w-full text-left text-lg">
            <thead className="border-b-2 border-surface-line text-base text-ink-muted">
              <tr>
                <th scope="col" className="py-2 pr-3">Part number</th>
                <th scope="col" className="py-2 pr-3">Description</th>
                <th scope="col" className="py-2 pr-3">Qty</th>
                <th scope="col" className="py-2 pr-3">Serial removed</th>
                <th scope="col" className="py-2 pr-3">Serial fitted</th>
              </tr>
            </thead>
            <tbody>
              {c.parts.map((p) => (
                <tr key={p.id} className="border-b border-surface-line">
                  <td className="py-2 pr-3 font-mono">{p.partNumber}</td>
                  <td className="py-2 pr-3">{p.description || '—'}</td>
                  <td className="py-2 pr-3">{p.quantity}</td>
                  <td className="py-2 pr-3 font-mono">{p.serialRemoved ?? '—'}</td>
                  <td className="py-2 pr-3 font-mono">{p.serialFitted ?? '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </RecordSection>
      <RecordSection title="Return to service and sign-off">
        <dl className="grid gap-4 md:grid-cols-3">
          <Fact term="Fault cleared">{rts ? yes(rts.faultCleared) : null}</Fact>
          <Fact term="Crank-angle display agrees with top dead centre">{rts ? yes(rts.tdcAgrees) : null}</Fact>
          <Fact term="Stopping-time / brake-monitor check">{rts ? `${yes(rts.stoppingTimeChecked)}${rts.stoppingTimeMs ? ` (${rts.stoppingTimeMs} ms)` : ''}` : null}</Fact>
          <Fact term="Presence-sensing device distance">{rts ? (rts.presenceSensingDistanceOk === 'yes' ? 'Still at a safe distance' : 'No device fitted') : null}</Fact>
          <Fact term="Signed by">{c.contactName ? `${c.contactName}${c.contactEmail ? ` (${c.contactEmail})` : ''}` : null}</Fact>
          <Fact term="Signed at">{c.signedAt ? formatDateTime(c.signedAt) : null}</Fact>
        </dl>
        {signature ? (
          <img src={signature.url} alt={`Signature of ${c.contactName ?? 'the customer contact'}`} className="max-h-40 rounded-lg border border-surface-line bg-white p-2" />
        ) : (
          <p className="text-lg text-ink-muted">No signature image is stored for this visit.</p>
        )}
      </RecordSection>
    </>
  );
}
