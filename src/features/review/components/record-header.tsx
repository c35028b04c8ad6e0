import type { VisitDetail } from '@shared/schemas/visit-detail';
import { CAUSE_LABELS } from '@shared/schemas/visit';
import { Banner } from '@/components/ui/banner';
import { formatDateTime, hoursMinutes, STATUS_LABELS } from '../lib/format';
import { Fact } from './record-section';

export function RecordHeader({ visit }: { visit: VisitDetail }) {
  const repair = visit.startedAt && visit.closedAt ? (new Date(visit.closedAt).getTime() - new Date(visit.startedAt).getTime()) / 60_000 : null;
  const press = visit.press;
  return (
    <div className="space-y-4">
      <dl className="grid grid-cols-2 gap-4 rounded-xl border border-surface-line bg-surface-raised p-5 md:grid-cols-4">
        <Fact term="Status">{STATUS_LABELS[visit.status]}</Fact>
        <Fact term="Press">{press ? `${press.assetTag} · ${press.model}` : null}</Fact>
        <Fact term="Customer and site">{press ? `${press.customerName} · ${press.siteName}` : null}</Fact>
        <Fact term="Technician">{visit.technician.name}</Fact>
        <Fact term="Started">{formatDateTime(visit.startedAt)}</Fact>
        <Fact term="Closed">{visit.closedAt ? formatDateTime(visit.closedAt) : null}</Fact>
        <Fact term="Time to repair (h:mm)">{repair === null ? null : hoursMinutes(repair)}</Fact>
        <Fact term="Root cause">{visit.closeOut.causeCategory ? CAUSE_LABELS[visit.closeOut.causeCategory] : null}</Fact>
        <Fact term="Fault as displayed" className="col-span-2 md:col-span-4">
          {visit.faultDisplayed}
        </Fact>
        <Fact term="Press-control firmware (found → left)">{`${visit.controlFirmwareFound ?? '—'} → ${visit.controlFirmwareLeft ?? '—'}`}</Fact>
        <Fact term="Monitor firmware (found → left)">{`${visit.monitorFirmwareFound ?? '—'} → ${visit.monitorFirmwareLeft ?? '—'}`}</Fact>
        <Fact term="Procedure">{`${visit.procedure.title} v${visit.procedure.version}`}</Fact>
        <Fact term="Band set judged against">{visit.bandSet ? `${visit.bandSet.label} (${visit.bandSet.generation} v${visit.bandSet.version})` : null}</Fact>
      </dl>
      {visit.status === 'returned' && visit.reviewComment && (
        <Banner title="Returned to the technician with this comment">{visit.reviewComment}</Banner>
      )}
    </div>
  );
}
