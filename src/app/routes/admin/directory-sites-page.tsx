import { PageShell } from '@/components/ui/page-shell';
import { SiteDirectory } from '@/features/admin-directory/components/directory-workspace';

export function DirectorySitesPage() {
  return (
    <PageShell title="Manage sites" description="The plants of each customer.">
      <SiteDirectory />
    </PageShell>
  );
}
