import { useQuery } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import type { ReportDelivery } from '@shared/schemas/email';
import { formatDateTime } from '@shared/format/date-time';
import { Banner } from '@/components/ui/banner';
import { buttonVariants } from '@/components/ui/button';
import { Spinner } from '@/components/ui/spinner';
import { reportDeliveryOptions } from '@/api/visits';
import { errorMessage } from '@/lib/api-error';

interface ReportDeliveryNoticeProps {
  visitId: number;
  /** Just closed here: bring the notice into view and give it focus, so it is the first thing read. */
  focusOnShow?: boolean;
}

function Links({ delivery }: { delivery: ReportDelivery }) {
  if (!delivery.reportPath && !delivery.pdfPath) return null;
  return (
    <div className="mt-3 flex flex-wrap gap-3">
      {delivery.reportPath && (
        <a href={delivery.reportPath} target="_blank" rel="noreferrer" className={buttonVariants({ variant: 'secondary' })}>
          Open the customer’s report page
        </a>
      )}
      {delivery.pdfPath && (
        <a href={delivery.pdfPath} className={buttonVariants({ variant: 'secondary' })}>
          Download the PDF
        </a>
      )}
    </div>
  );
}

/** What one report e-mail's state means for the technician, and what to do next where there is something to do. */
function describe(d: ReportDelivery): { title: string; body: string; tone: 'info' | 'error' } {
  const at = (iso: string | null) => formatDateTime(iso, d.timeZone);
  const which = d.issueNumber > 1 ? 'Corrected report' : 'Report';
  switch (d.status) {
    case 'sent':
      return { tone: 'info', title: `${which} e-mailed to ${d.to} at ${at(d.sentAt)}`, body: 'The customer has the report and its PDF. Nothing more to do.' };
    case 'sending':
      return { tone: 'info', title: `${which} being sent to ${d.to} now`, body: 'This notice changes when the mail server has taken it.' };
    case 'queued':
      return d.attempts === 0
        ? { tone: 'info', title: `${which} queued for ${d.to}`, body: `Queued at ${at(d.queuedAt)}; it will be sent at ${at(d.nextAttemptAt)} at the latest. Nothing to do.` }
        : {
            tone: 'info',
            title: `${which} to ${d.to} queued, will be sent at ${at(d.nextAttemptAt)}`,
            body: `The mail server could not take it yet (${d.lastError ?? 'no answer'}). Crankwise tries again by itself. If it has not gone out by the end of the day, tell the office; you can hand the customer the PDF meanwhile.`,
          };
    case 'failed':
      return {
        tone: 'error',
        title: `${which} e-mail to ${d.to} failed`,
        body: `${d.lastError ?? 'The mail server refused it.'} Check the address with the customer and ask the office to send it again (they can correct the address on the visit record); meanwhile you can give the customer the PDF.`,
      };
  }
}

/** After closing: to whom the report went, when (with the time zone), and links to what the customer sees. */
export function ReportDeliveryNotice({ visitId, focusOnShow }: ReportDeliveryNoticeProps) {
  const delivery = useQuery(reportDeliveryOptions(visitId));
  const ref = useRef<HTMLDivElement | null>(null);
  const shown = delivery.data?.delivery;
  useEffect(() => {
    if (!focusOnShow || !shown || !ref.current) return;
    ref.current.focus();
    ref.current.scrollIntoView?.({ block: 'start' });
  }, [focusOnShow, shown]);

  if (delivery.isPending) return <Spinner label="Checking the report e-mail…" />;
  if (delivery.isError) {
    return (
      <Banner tone="error" className="mb-6" title="Could not check the report e-mail">
        {errorMessage(delivery.error)}
      </Banner>
    );
  }
  if (!shown) return null;
  const { title, body, tone } = describe(shown);
  return (
    <div ref={ref} tabIndex={-1} className="mb-6 rounded-lg focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent">
      <Banner tone={tone} role="status" title={title}>
        <p>{body}</p>
        <Links delivery={shown} />
      </Banner>
    </div>
  );
}
