import type { ReadingRecord } from '@shared/schemas/visit-detail';
import { ConflictDialog } from '@/components/ui/conflict-dialog';
import { VerdictMark } from '@/components/ui/verdict-mark';
import { formatWhen } from '../../lib/step-records';

interface ReadingConflictProps {
  label: string;
  sent: string;
  onServer: ReadingRecord | null;
  busy: boolean;
  onKeepMine: (onServer: ReadingRecord | null) => void;
  onTakeTheirs: (onServer: ReadingRecord | null) => void;
}

/** The value typed here beside the one another tab or device saved first for the same winding and place. */
export function ReadingConflict({ label, sent, onServer, busy, onKeepMine, onTakeTheirs }: ReadingConflictProps) {
  return (
    <ConflictDialog
      title="This reading was saved on another device"
      explanation={
        <p>
          {label} was saved on another tab or device after this screen loaded. Your value is not saved yet. Choose which one stands; the other stays in the
          visit’s history.
        </p>
      }
      yours={<p className="text-2xl font-semibold">{sent}</p>}
      theirs={
        onServer ? (
          <>
            <p className="text-2xl font-semibold">{onServer.entered}</p>
            <p className="flex flex-wrap items-center gap-2">
              {onServer.verdict && <VerdictMark verdict={onServer.verdict} />} {onServer.reason}
            </p>
            <p className="text-base text-ink-muted">Saved on {formatWhen(onServer.createdAt)}.</p>
          </>
        ) : (
          <p>No value: it was taken back.</p>
        )
      }
      keepMineLabel="Keep mine"
      takeTheirsLabel="Use the server’s"
      busy={busy}
      onKeepMine={() => onKeepMine(onServer)}
      onTakeTheirs={() => onTakeTheirs(onServer)}
    />
  );
}
