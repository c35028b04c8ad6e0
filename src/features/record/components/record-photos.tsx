import { photoLabel, RECORD_SECTIONS as S } from '@shared/record/record-wording';
import type { VisitRecord } from '@shared/schemas/visit-record';
import type { RecordPictureUrls } from './record-urls';
import { Section } from '@/components/ui/section';

/** Photo evidence as thumbnails; where the full picture can be opened, each opens in a new tab. */
export function RecordPhotos({ record, urls }: { record: VisitRecord; urls: RecordPictureUrls }) {
  if (record.photos.length === 0) return null;
  return (
    <Section title={`${S.photos} (${record.photos.length})`}>
      <ul className="grid grid-cols-2 gap-4 md:grid-cols-3">
        {record.photos.map((p, i) => {
          const label = photoLabel(i, p.caption, p.stepTitle);
          const src = p.hasThumb || !urls.full ? urls.thumb(p.id) : urls.full(p.id);
          const figure = (
            <figure className="space-y-1">
              <img src={src} alt={label} loading="lazy" className="aspect-[4/3] w-full rounded-md border border-surface-line bg-surface-sunken object-contain" />
              <figcaption className="text-base text-ink-muted">{label}</figcaption>
            </figure>
          );
          return (
            <li key={p.id}>
              {urls.full ? (
                <a href={urls.full(p.id)} target="_blank" rel="noreferrer" className="block rounded-md focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent">
                  {figure}
                  <span className="sr-only">(opens the full photo in a new tab)</span>
                </a>
              ) : (
                figure
              )}
            </li>
          );
        })}
      </ul>
    </Section>
  );
}
