import { PageHeader } from '@/components/ui/page-header';
import { FirmwareRulesWorkspace } from '@/features/admin-reference/components/firmware-rules-workspace';
import { useDocumentTitle } from '@/lib/use-document-title';

export function FirmwareRulesPage() {
  useDocumentTitle('Firmware rules');
  return (
    <>
      <PageHeader title="Firmware rules" description="Which press-control and monitor-module versions work together. Edit a draft; publishing makes it the set new visits use." />
      <FirmwareRulesWorkspace />
    </>
  );
}
