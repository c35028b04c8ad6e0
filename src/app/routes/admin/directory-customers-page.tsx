import { PageHeader } from '@/components/ui/page-header';
import { CustomerDirectory } from '@/features/admin-directory/components/directory-workspace';
import { useDocumentTitle } from '@/lib/use-document-title';

export function DirectoryCustomersPage() {
  useDocumentTitle('Manage customers');
  return (
    <>
      <PageHeader title="Manage customers" description="Add customers and keep their contact details current; reports go to the contact e-mail." />
      <CustomerDirectory />
    </>
  );
}
