import { PageHeader } from '@/components/ui/page-header';
import { SiteDirectory } from '@/features/admin-directory/components/directory-workspace';
import { useDocumentTitle } from '@/lib/use-document-title';

export function DirectorySitesPage() {
  useDocumentTitle('Manage sites');
  return (
    <>
      <PageHeader title="Manage sites" description="The plants of each customer." />
      <SiteDirectory />
    </>
  );
}
