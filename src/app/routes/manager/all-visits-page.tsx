import { PageHeader } from '@/components/ui/page-header';
import { AllVisits } from '@/features/visit-table/components/all-visits';
import { useDocumentTitle } from '@/lib/use-document-title';
import { managerPaths } from './manager-paths';

export function AllVisitsPage() {
  useDocumentTitle('All visits');
  return (
    <>
      <PageHeader title="All visits" description="Filter, sort and export every visit of every technician." />
      <AllVisits recordHref={managerPaths.record} pressHistoryHref={managerPaths.pressHistory} />
    </>
  );
}
