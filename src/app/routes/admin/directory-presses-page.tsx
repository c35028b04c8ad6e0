import { PageHeader } from '@/components/ui/page-header';
import { PressDirectory } from '@/features/admin-directory/components/directory-workspace';
import { useDocumentTitle } from '@/lib/use-document-title';

export function DirectoryPressesPage() {
  useDocumentTitle('Manage presses');
  return (
    <>
      <PageHeader title="Manage presses" description="Each press with its site, control, sensor generation and firmware as installed." />
      <PressDirectory />
    </>
  );
}
