import { PageShell } from '@/components/ui/page-shell';
import { FirmwareRulesWorkspace } from '@/features/admin-reference/components/firmware-rules-workspace';

export function FirmwareRulesPage() {
  return (
    <PageShell title="Firmware rules" description="Which press-control and monitor-module versions work together. Edit a draft; publishing makes it the set new visits use.">
      <FirmwareRulesWorkspace />
    </PageShell>
  );
}
