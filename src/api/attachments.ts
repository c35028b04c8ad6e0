import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { AttachmentDto } from '@shared/schemas/attachment';
import { apiRequest } from '@/lib/api-client';
import { visitKeys } from './visits';

export interface AttachmentFilters {
  kind?: AttachmentDto['kind'];
  stepId?: string;
}

export const attachmentKeys = {
  all: [...visitKeys.all, 'attachments'] as const,
  /** Every attachment list of one visit: what an upload or a delete invalidates. */
  visit: (visitId: number) => [...attachmentKeys.all, visitId] as const,
  list: (visitId: number, filters: AttachmentFilters) => [...attachmentKeys.visit(visitId), filters] as const,
};

export const attachmentsPath = (visitId: number) => `/api/visits/${visitId}/attachments`;

/** GET /api/visits/:visitId/attachments: photos and the signature, optionally of one kind or one step. */
export const attachmentListOptions = (visitId: number, filters: AttachmentFilters = {}) =>
  queryOptions({
    queryKey: attachmentKeys.list(visitId, filters),
    queryFn: ({ signal }) => apiRequest<{ items: AttachmentDto[] }>(attachmentsPath(visitId), { query: { ...filters }, signal }),
  });

/**
 * The photos of one step, or (stepId null) the general photos of the visit: the server lists every
 * photo when no step is given, so the ones that belong to a step are left out here.
 */
export const photoListOptions = (visitId: number, stepId: string | null) =>
  queryOptions({
    ...attachmentListOptions(visitId, { kind: 'photo', stepId: stepId ?? undefined }),
    select: (data) => data.items.filter((photo) => photo.stepId === stepId),
  });

export function useDeleteAttachment(visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (attachmentId: string) => apiRequest<void>(`${attachmentsPath(visitId)}/${attachmentId}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentKeys.visit(visitId) }),
  });
}

export interface PhotoUpload {
  visitId: number;
  stepId: string | null;
  /** Made on the tablet once per photo: a retry sends it again and the server stores the photo only once. */
  id: string;
  caption: string;
  file: File;
}

/**
 * Sends one photo as multipart/form-data. fetch has no upload progress, so the panel shows
 * "Uploading…" per photo; one photo per request keeps each status, error and retry to the photo
 * it belongs to.
 */
export async function uploadPhoto({ visitId, stepId, id, caption, file }: PhotoUpload): Promise<AttachmentDto[]> {
  const form = new FormData();
  form.append('id', id);
  if (stepId) form.append('stepId', stepId);
  if (caption.trim()) form.append('caption', caption.trim());
  form.append('photos', file, file.name);
  const answer = await apiRequest<{ items: AttachmentDto[] }>(attachmentsPath(visitId), {
    method: 'POST',
    body: form,
    networkError: 'The photo did not reach Crankwise: the network dropped. It is kept on this tablet; press Retry when the connection is back.',
  });
  return answer.items;
}

export function useUploadPhoto(visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadPhoto,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentKeys.visit(visitId) }),
  });
}
