import type { VisitDetail } from '@shared/schemas/visit-detail';
import { PageHeader } from '@/components/ui/page-header';

/** Which visit this is: reference, press, customer and the fault as it was displayed. */
export function CloseOutHeader({ visit }: { visit: VisitDetail }) {
  return (
    <>
      <PageHeader title={`Close out ${visit.reference}`} />
      <dl className="mb-8 grid gap-x-8 gap-y-2 rounded-lg border-2 border-surface-line bg-surface-raised p-4 text-lg sm:grid-cols-[auto_1fr]">
        <dt className="font-semibold text-ink-muted">Press</dt>
        <dd className="text-ink">{visit.press ? `${visit.press.assetTag} · ${visit.press.model}` : 'Not recorded'}</dd>
        <dt className="font-semibold text-ink-muted">Customer</dt>
        <dd className="text-ink">{[visit.press?.customerName, visit.press?.siteName].filter(Boolean).join(' · ') || 'Not recorded'}</dd>
        <dt className="font-semibold text-ink-muted">Fault as displayed</dt>
        <dd className="text-ink">{visit.faultDisplayed}</dd>
      </dl>
    </>
  );
}
