import { queryOptions } from '@tanstack/react-query';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { apiRequest } from '@/lib/api-client';

export const visitDetailKey = (id: number) => ['visits', 'detail', id] as const;

/** The visit being closed out; the same key as the workspace, so both read one cache entry. */
export const visitDetailOptions = (id: number) =>
  queryOptions({
    queryKey: visitDetailKey(id),
    queryFn: ({ signal }) => apiRequest<VisitDetail>(`/api/visits/${id}`, { signal }),
  });
