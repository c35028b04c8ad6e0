import type { ApiErrorBody } from '@shared/schemas/common';
import { ApiError } from '@/lib/api-error';
import { attachmentsPath, type VisitPhoto } from './photo-queries';

export interface PhotoUpload {
  visitId: number;
  stepId: string | null;
  /** Made on the tablet once per photo: a retry sends it again and the server stores the photo only once. */
  id: string;
  caption: string;
  file: File;
}

const NETWORK_ERROR = {
  code: 'network_error',
  message: 'The photo did not reach Crankwise: the network dropped. It is kept on this tablet; press Retry when the connection is back.',
};

/**
 * Sends one photo as multipart/form-data (the JSON api client cannot). fetch has no upload
 * progress, so the panel shows "Uploading…" per photo; one photo per request keeps each status,
 * error and retry to the photo it belongs to.
 */
export async function uploadPhoto({ visitId, stepId, id, caption, file }: PhotoUpload): Promise<VisitPhoto[]> {
  const form = new FormData();
  form.append('id', id);
  if (stepId) form.append('stepId', stepId);
  if (caption.trim()) form.append('caption', caption.trim());
  form.append('photos', file, file.name);

  let response: Response;
  try {
    response = await fetch(attachmentsPath(visitId), { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json' } });
  } catch {
    throw new ApiError(0, NETWORK_ERROR);
  }
  const payload: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const error = (payload as Partial<ApiErrorBody> | undefined)?.error;
    throw new ApiError(
      response.status,
      error && typeof error.message === 'string'
        ? error
        : { code: 'http_error', message: `The server refused the photo (HTTP ${response.status}). Try again in a moment.` },
    );
  }
  return (payload as { items: VisitPhoto[] }).items;
}
