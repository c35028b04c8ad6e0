import { PageShell } from '@/components/ui/page-shell';
import { Dashboard } from '@/features/figures/components/dashboard';
import { managerPaths } from './manager-paths';

export function DashboardPage() {
  return (
    <PageShell title="Dashboard" description="First-time fixes, time to repair, root causes and repeat visits.">
      <Dashboard recordHref={managerPaths.record} pressHistoryHref={managerPaths.pressHistory} />
    </PageShell>
  );
}
