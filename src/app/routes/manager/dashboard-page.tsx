import { PageHeader } from '@/components/ui/page-header';
import { Dashboard } from '@/features/figures/components/dashboard';
import { useDocumentTitle } from '@/lib/use-document-title';
import { managerPaths } from './manager-paths';

export function DashboardPage() {
  useDocumentTitle('Dashboard');
  return (
    <>
      <PageHeader title="Dashboard" description="First-time fixes, time to repair, root causes and repeat visits." />
      <Dashboard recordHref={managerPaths.record} pressHistoryHref={managerPaths.pressHistory} />
    </>
  );
}
