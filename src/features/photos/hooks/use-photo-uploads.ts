import { useState } from 'react';
import { isApiError } from '@/lib/api-error';
import { useUploadPhoto } from '@/api/attachments';

export interface PhotoUploadEntry {
  id: string;
  fileName: string;
  caption: string;
  file: File;
  status: 'uploading' | 'saved' | 'failed';
  error?: unknown;
}

/** Worth sending the same photo again: the network dropped, or the server had trouble of its own. */
export function canRetry(error: unknown): boolean {
  if (!isApiError(error)) return true;
  return error.status === 0 || error.status >= 500 || error.code === 'upload_in_progress';
}

/**
 * The photos this panel is sending, each with its own client id and status. They live here (not in
 * the query cache) because they are the tablet's own work until the server has stored them.
 */
export function usePhotoUploads(visitId: number, stepId: string | null) {
  const upload = useUploadPhoto(visitId);
  const [entries, setEntries] = useState<PhotoUploadEntry[]>([]);

  const update = (id: string, change: Partial<PhotoUploadEntry>) =>
    setEntries((all) => all.map((entry) => (entry.id === id ? { ...entry, ...change } : entry)));

  const send = (entry: PhotoUploadEntry) => {
    upload
      .mutateAsync({ visitId, stepId, id: entry.id, caption: entry.caption, file: entry.file })
      .then(() => update(entry.id, { status: 'saved', error: undefined }))
      .catch((error: unknown) => update(entry.id, { status: 'failed', error }));
  };

  const add = (files: File[], caption: string) => {
    // One request per photo: a refused photo does not sink the others, and each keeps its own retry.
    const fresh = files.map((file): PhotoUploadEntry => ({ id: crypto.randomUUID(), fileName: file.name, caption, file, status: 'uploading' }));
    // The last batch's "Saved" lines make way for the new one; failures stay until retried or removed.
    setEntries((all) => [...all.filter((entry) => entry.status !== 'saved'), ...fresh]);
    fresh.forEach(send);
  };

  const retry = (id: string) => {
    const entry = entries.find((e) => e.id === id);
    if (!entry) return;
    update(id, { status: 'uploading', error: undefined });
    send(entry);
  };

  const dismiss = (id: string) => setEntries((all) => all.filter((entry) => entry.id !== id));

  return { entries, add, retry, dismiss };
}
