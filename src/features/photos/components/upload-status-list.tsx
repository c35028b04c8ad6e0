import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/api-error';
import { canRetry, type PhotoUploadEntry } from '../hooks/use-photo-uploads';

interface UploadStatusListProps {
  entries: PhotoUploadEntry[];
  onRetry: (id: string) => void;
  onDismiss: (id: string) => void;
}

const MARKS = {
  uploading: { glyph: '↑', text: 'Uploading…', tone: 'text-ink-muted' },
  saved: { glyph: '✓', text: 'Saved', tone: 'text-verdict-in_band' },
  failed: { glyph: '✕', text: 'Not saved', tone: 'text-verdict-out_of_band' },
} as const;

/** What became of each photo sent from this panel, in words and a mark, with the way forward when one failed. */
export function UploadStatusList({ entries, onRetry, onDismiss }: UploadStatusListProps) {
  if (entries.length === 0) return null;
  return (
    <ul aria-label="Photo uploads" className="space-y-3">
      {entries.map((entry) => {
        const mark = MARKS[entry.status];
        const retryable = entry.status === 'failed' && canRetry(entry.error);
        return (
          <li key={entry.id} className="rounded-lg border-2 border-surface-line bg-surface-raised p-3 text-lg">
            <p className="flex flex-wrap items-center gap-2">
              <span aria-hidden="true" className={`font-bold ${mark.tone}`}>
                {mark.glyph}
              </span>
              <span className={`font-semibold ${mark.tone}`}>{mark.text}</span>
              <span className="break-all text-ink">{entry.fileName}</span>
              {entry.caption && <span className="text-ink-muted">“{entry.caption}”</span>}
            </p>
            {entry.status === 'failed' && (
              <div role="alert" className="mt-2 space-y-2">
                <p className="text-ink">{errorMessage(entry.error)}</p>
                <p className="text-base text-ink-muted">
                  {retryable
                    ? 'The photo is kept on this tablet. Press Retry once the connection is back; it will not be stored twice.'
                    : 'This photo cannot be sent as it is. Remove it from the list and take or choose it again.'}
                </p>
                <div className="flex flex-wrap gap-3">
                  {retryable && <Button onClick={() => onRetry(entry.id)}>Retry</Button>}
                  <Button variant="secondary" onClick={() => onDismiss(entry.id)}>
                    Remove from list
                  </Button>
                </div>
              </div>
            )}
          </li>
        );
      })}
    </ul>
  );
}
