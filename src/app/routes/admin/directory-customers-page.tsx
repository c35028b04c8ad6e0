import { PageShell } from '@/components/ui/page-shell';
import { CustomerDirectory } from '@/features/admin-directory/components/directory-workspace';

export function DirectoryCustomersPage() {
  return (
    <PageShell title="Manage customers" description="Add customers and keep their contact details current; reports go to the contact e-mail.">
      <CustomerDirectory />
    </PageShell>
  );
}
