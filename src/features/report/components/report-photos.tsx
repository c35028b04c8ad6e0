import { reportThumbUrl } from '@/api/report';
import type { ReportView } from '@shared/schemas/report-view';
import { ReportSection } from './report-section';

export function ReportPhotos({ report, token }: { report: ReportView; token: string }) {
  if (report.photos.length === 0) return null;
  return (
    <ReportSection title="Photos">
      <ul className="grid grid-cols-2 gap-4 md:grid-cols-3">
        {report.photos.map((p, i) => {
          const label = [`Photo ${i + 1}`, p.caption, p.stepTitle && `(${p.stepTitle})`].filter(Boolean).join(' ');
          return (
            <li key={p.id}>
              <figure className="space-y-1">
                <img src={reportThumbUrl(token, p.id)} alt={label} loading="lazy" className="aspect-[4/3] w-full rounded-md border border-surface-line bg-surface-sunken object-contain" />
                <figcaption className="text-base text-ink-muted">{label}</figcaption>
              </figure>
            </li>
          );
        })}
      </ul>
    </ReportSection>
  );
}
