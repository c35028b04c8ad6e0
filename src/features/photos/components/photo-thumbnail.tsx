import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/api-error';
import type { AttachmentDto } from '@shared/schemas/attachment';
import { useDeleteAttachment } from '@/api/attachments';

interface PhotoThumbnailProps {
  photo: AttachmentDto;
  /** "Photo 3": the name of a photo without a caption. */
  fallbackName: string;
  canDelete: boolean;
}

/** One stored photo: the thumbnail opens the full picture; deleting asks first. */
export function PhotoThumbnail({ photo, fallbackName, canDelete }: PhotoThumbnailProps) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteAttachment(photo.visitId);
  const name = photo.caption ?? fallbackName;

  return (
    <figure className="space-y-2 rounded-lg border-2 border-surface-line bg-surface-raised p-2">
      <a href={photo.url} target="_blank" rel="noreferrer" className="block focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent">
        <img src={photo.thumbUrl ?? photo.url} alt={name} className="aspect-[4/3] w-full rounded object-cover" loading="lazy" />
      </a>
      <figcaption className="text-lg text-ink">{photo.caption ?? <span className="text-ink-muted">No caption</span>}</figcaption>
      {canDelete && !confirming && (
        <Button variant="secondary" block aria-label={`Delete ${name}`} onClick={() => setConfirming(true)}>
          Delete
        </Button>
      )}
      {canDelete && confirming && (
        <div role="group" aria-label={`Confirm deleting ${name}`} className="space-y-2">
          <p className="text-lg font-semibold text-ink">Delete this photo for good?</p>
          <div className="flex flex-wrap gap-2">
            <Button className="bg-danger text-danger-ink hover:bg-danger" disabled={remove.isPending} onClick={() => remove.mutate(photo.id)}>
              {remove.isPending ? 'Deleting…' : 'Yes, delete'}
            </Button>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Keep it
            </Button>
          </div>
        </div>
      )}
      {remove.isError && (
        <p role="alert" className="text-base font-medium text-verdict-out_of_band">
          {errorMessage(remove.error)}
        </p>
      )}
    </figure>
  );
}
