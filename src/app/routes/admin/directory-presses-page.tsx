import { PageShell } from '@/components/ui/page-shell';
import { PressDirectory } from '@/features/admin-directory/components/directory-workspace';

export function DirectoryPressesPage() {
  return (
    <PageShell title="Manage presses" description="Each press with its site, control, sensor generation and firmware as installed.">
      <PressDirectory />
    </PageShell>
  );
}
