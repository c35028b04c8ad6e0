import type { AttachmentDto } from '@shared/schemas/attachment';
import { RecordSection } from './record-section';

/** Photo evidence as thumbnails; each opens the full picture in a new tab. */
export function RecordPhotos({ photos }: { photos: AttachmentDto[] }) {
  return (
    <RecordSection title={`Photos (${photos.length})`}>
      {photos.length === 0 ? (
        <p className="text-lg text-ink-muted">No photos were taken on this visit.</p>
      ) : (
        <ul className="grid grid-cols-2 gap-4 sm:grid-cols-3 lg:grid-cols-4">
          {photos.map((photo, i) => {
            const label = photo.caption || `Photo ${i + 1}`;
            return (
              <li key={photo.id}>
                <a href={photo.url} target="_blank" rel="noreferrer" className="block rounded-lg focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent">
                  <img src={photo.thumbUrl ?? photo.url} alt={label} loading="lazy" className="aspect-square w-full rounded-lg border border-surface-line object-cover" />
                  <span className="mt-1 block text-base text-ink">{label}</span>
                  <span className="sr-only">(opens the full photo in a new tab)</span>
                </a>
              </li>
            );
          })}
        </ul>
      )}
    </RecordSection>
  );
}
