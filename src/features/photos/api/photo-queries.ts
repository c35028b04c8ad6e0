import { queryOptions } from '@tanstack/react-query';
import type { AttachmentDto } from '@shared/schemas/attachment';
import { apiRequest } from '@/lib/api-client';

/** One stored photo, as the attachments API answers it (the shape shared with the server). */
export type VisitPhoto = AttachmentDto;

export const photoKeys = {
  /** Every photo list of one visit: what an upload or a delete invalidates. */
  visit: (visitId: number) => ['visits', 'photos', visitId] as const,
  step: (visitId: number, stepId: string) => ['visits', 'photos', visitId, stepId] as const,
};

export const attachmentsPath = (visitId: number) => `/api/visits/${visitId}/attachments`;

/**
 * The photos of one step, or (stepId null) the general photos of the visit: the server lists every
 * photo when no step is given, so the ones that belong to a step are left out here.
 */
export const photoListOptions = (visitId: number, stepId: string | null) =>
  queryOptions({
    queryKey: stepId ? photoKeys.step(visitId, stepId) : photoKeys.visit(visitId),
    queryFn: ({ signal }) =>
      apiRequest<{ items: VisitPhoto[] }>(attachmentsPath(visitId), { query: { kind: 'photo', stepId: stepId ?? undefined }, signal }),
    select: (data) => data.items.filter((photo) => photo.stepId === stepId),
  });
