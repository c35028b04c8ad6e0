import { Banner } from './banner';
import { Button } from './button';

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** Says that unsaved typing was brought back from this device, and offers to throw it away. */
export function RestoredNotice({ savedAt, onDiscard, what = 'what you typed' }: { savedAt: string; onDiscard: () => void; what?: string }) {
  return (
    <Banner
      role="status"
      title={`Restored ${what} on ${when.format(new Date(savedAt))}`}
      action={
        <Button variant="secondary" onClick={onDiscard}>
          Discard
        </Button>
      }
    >
      It was kept on this device and has not been saved yet. Check it, then carry on; Discard starts again from what is saved.
    </Banner>
  );
}
