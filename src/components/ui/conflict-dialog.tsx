import type { ReactNode } from 'react';
import { Button } from './button';
import { Modal } from './modal';

interface ConflictDialogProps {
  title: string;
  /** One sentence on what happened and what choosing does. */
  explanation: ReactNode;
  yours: ReactNode;
  theirs: ReactNode;
  keepMineLabel: string;
  takeTheirsLabel: string;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
  busy?: boolean;
}

/**
 * Two versions of the same thing, side by side: what this device sent ("Yours") and what another
 * tab or device saved first ("Saved on the server"). Nothing is overwritten until the person chooses.
 */
export function ConflictDialog({ title, explanation, yours, theirs, keepMineLabel, takeTheirsLabel, onKeepMine, onTakeTheirs, busy }: ConflictDialogProps) {
  return (
    <Modal title={title}>
      <div className="text-lg text-ink">{explanation}</div>
      <div className="grid gap-4 sm:grid-cols-2">
        <section aria-label="Yours" className="space-y-2 rounded-lg border-2 border-accent bg-accent-soft p-4">
          <h3 className="text-base font-semibold uppercase tracking-wide text-ink">Yours (this device)</h3>
          <div className="text-lg text-ink">{yours}</div>
        </section>
        <section aria-label="Saved on the server" className="space-y-2 rounded-lg border-2 border-surface-edge bg-surface-sunken p-4">
          <h3 className="text-base font-semibold uppercase tracking-wide text-ink">Saved on the server</h3>
          <div className="text-lg text-ink">{theirs}</div>
        </section>
      </div>
      <div className="flex flex-col gap-3 sm:flex-row sm:justify-end">
        <Button variant="secondary" size="lg" onClick={onTakeTheirs} disabled={busy}>
          {takeTheirsLabel}
        </Button>
        <Button size="lg" onClick={onKeepMine} disabled={busy}>
          {keepMineLabel}
        </Button>
      </div>
    </Modal>
  );
}
