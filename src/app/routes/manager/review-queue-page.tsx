import { PageShell } from '@/components/ui/page-shell';
import { ReviewQueueList } from '@/features/review/components/review-queue-list';
import { managerPaths } from './manager-paths';

export function ReviewQueuePage() {
  return (
    <PageShell title="Review queue" description="Closed visits waiting for your approval, the longest-waiting first.">
      <ReviewQueueList recordHref={managerPaths.record} />
    </PageShell>
  );
}
