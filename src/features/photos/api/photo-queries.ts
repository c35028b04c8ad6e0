import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

/**
 * One stored photo, as GET/POST /api/visits/:visitId/attachments answer it. The server keeps this
 * shape in its attachments module until it moves to shared/schemas; keep the two in step.
 */
export interface VisitPhoto {
  id: string;
  visitId: number;
  kind: 'photo' | 'signature';
  stepId: string | null;
  caption: string | null;
  mimeType: 'image/jpeg' | 'image/png' | 'image/webp';
  bytes: number;
  width: number | null;
  height: number | null;
  url: string;
  thumbUrl: string | null;
  createdBy: number;
  createdAt: string;
}

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
