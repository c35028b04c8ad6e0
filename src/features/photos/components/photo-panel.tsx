import { useQuery } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { Field } from '@/components/ui/field';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { TextInput } from '@/components/ui/text-input';
import { photoListOptions } from '@/api/attachments';
import { usePhotoUploads } from '../hooks/use-photo-uploads';
import { PhotoThumbnail } from './photo-thumbnail';
import { TakePhotoButton } from './take-photo-button';
import { UploadStatusList } from './upload-status-list';

const MAX_CAPTION_LENGTH = 300;

/**
 * Photo evidence for a step (stepId) or the whole visit (null): take several, caption them, see and
 * delete them. `prompt` says what to photograph; `disabled` (visit not open) shows photos read-only.
 */
export function PhotoPanel({ visitId, stepId, prompt, disabled }: { visitId: number; stepId: string | null; prompt?: string; disabled?: boolean }) {
  const headingId = useId();
  const promptId = useId();
  const photos = useQuery(photoListOptions(visitId, stepId));
  const uploads = usePhotoUploads(visitId, stepId);
  const [caption, setCaption] = useState('');

  return (
    <section aria-labelledby={headingId} className="space-y-4 rounded-lg border-2 border-surface-line bg-surface-raised p-4">
      <h2 id={headingId} className="text-2xl font-bold text-ink">
        Photos
      </h2>
      {prompt && (
        <p id={promptId} className="text-lg text-ink">
          {prompt}
        </p>
      )}
      {!disabled && (
        <div className="space-y-4">
          <Field label="Caption for the next photo (optional)" hint="Say what the photo shows, e.g. “Connector pin 3 bent”.">
            <TextInput value={caption} maxLength={MAX_CAPTION_LENGTH} onChange={(event) => setCaption(event.target.value)} />
          </Field>
          <TakePhotoButton
            describedBy={prompt ? promptId : undefined}
            onFiles={(files) => {
              uploads.add(files, caption);
              setCaption('');
            }}
          />
        </div>
      )}
      {disabled && <p className="text-lg text-ink-muted">This visit is not open, so photos can no longer be added or deleted.</p>}

      <div aria-live="polite">
        <UploadStatusList entries={uploads.entries} onRetry={uploads.retry} onDismiss={uploads.dismiss} />
      </div>

      {photos.isPending && <Spinner label="Loading photos…" />}
      {photos.isError && <LoadError error={photos.error} what="photos" onRetry={() => void photos.refetch()} />}
      {photos.data && photos.data.length === 0 && <p className="text-lg text-ink-muted">No photos yet.</p>}
      {photos.data && photos.data.length > 0 && (
        <ul aria-label="Stored photos" className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {photos.data.map((photo, index) => (
            <li key={photo.id}>
              <PhotoThumbnail photo={photo} fallbackName={`Photo ${index + 1}`} canDelete={!disabled} />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
