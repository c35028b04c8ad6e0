import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { errorMessage, isApiError, isStaleVersion } from '@/lib/api-error';
import type { ResilientSave } from '../hooks/use-resilient-save';

interface SaveStatusBannerProps {
  save: Pick<ResilientSave<unknown, unknown>, 'isWaitingToRetry' | 'isRejected' | 'isSaving' | 'isPaused' | 'error' | 'retryNow'>;
  /** What was being saved, e.g. "the reading" or "your answer". */
  what: string;
  className?: string;
}

/** Says plainly when a save has not reached the server, and that it is being sent again. */
export function SaveStatusBanner({ save, what, className }: SaveStatusBannerProps) {
  if (save.isWaitingToRetry) {
    const serverTrouble = isApiError(save.error) && save.error.status >= 500;
    return (
      <Banner
        tone="error"
        role="alert"
        className={className}
        title={serverTrouble ? 'Not saved — the server had a problem. Retrying…' : 'Not saved — no connection. Retrying…'}
        action={
          <Button variant="secondary" disabled={save.isSaving} onClick={save.retryNow}>
            {save.isPaused ? 'Waiting for the connection…' : save.isSaving ? 'Sending…' : 'Retry'}
          </Button>
        }
      >
        Keep working: {what} stays on this screen and is sent as soon as the connection is back.
      </Banner>
    );
  }
  // A conflict with another device's save is settled in its own dialog.
  if (save.isRejected && !isStaleVersion(save.error)) {
    return (
      <Banner tone="error" role="alert" className={className} title={`Not saved: ${what} needs attention`}>
        {errorMessage(save.error)}
      </Banner>
    );
  }
  return null;
}
