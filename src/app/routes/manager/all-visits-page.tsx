import { PageShell } from '@/components/ui/page-shell';
import { AllVisits } from '@/features/visit-table/components/all-visits';
import { managerPaths } from './manager-paths';

export function AllVisitsPage() {
  return (
    <PageShell title="All visits" description="Filter, sort and export every visit of every technician.">
      <AllVisits recordHref={managerPaths.record} pressHistoryHref={managerPaths.pressHistory} />
    </PageShell>
  );
}
