import { PageHeader } from '@/components/ui/page-header';
import { ReviewQueueList } from '@/features/review/components/review-queue-list';
import { useDocumentTitle } from '@/lib/use-document-title';
import { managerPaths } from './manager-paths';

export function ReviewQueuePage() {
  useDocumentTitle('Review queue');
  return (
    <>
      <PageHeader title="Review queue" description="Closed visits waiting for your approval, the longest-waiting first." />
      <ReviewQueueList recordHref={managerPaths.record} />
    </>
  );
}
