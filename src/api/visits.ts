import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { ReportDelivery } from '@shared/schemas/email';
import type { CancelVisitInput, CloseOutInput, ReadingSaveInput, StepAnswerInput, VisitCreateInput, VisitStatus } from '@shared/schemas/visit';
import type { ReadingRecord, StaleVersionCurrent, VisitDetail, VisitSummary } from '@shared/schemas/visit-detail';
import { apiRequest } from '@/lib/api-client';
import { isStaleVersion } from '@/lib/api-error';
import { withSignIn } from '@/lib/session-expiry';
import { resourceKeys } from './resource';

export interface VisitListFilters {
  mine: boolean;
  status?: VisitStatus;
  page: number;
  pageSize: number;
}

/** Every visit query lives under 'visits': invalidating `visitKeys.all` refreshes them all. */
export const visitKeys = resourceKeys<'visits', VisitListFilters>('visits');

export const visitPath = (id: number) => `/api/visits/${id}`;

export const visitListOptions = (filters: VisitListFilters) =>
  queryOptions({
    queryKey: visitKeys.list(filters),
    queryFn: ({ signal }) =>
      apiRequest<Page<VisitSummary>>('/api/visits', {
        query: { mine: filters.mine ? 'true' : undefined, status: filters.status, page: filters.page, pageSize: filters.pageSize },
        signal,
      }),
  });

/** The one visit record (GET /api/visits/:id): the workspace, the close-out and the manager's record share this cache entry. */
export const visitDetailOptions = (id: number) =>
  queryOptions({
    queryKey: visitKeys.detail(id),
    queryFn: ({ signal }) => apiRequest<VisitDetail>(visitPath(id), { signal }),
  });

/**
 * Where the newest report e-mail of a visit went and what the outbox did with it. Asked again every
 * few seconds while it is still queued or sending, so the technician sees it leave.
 */
export const reportDeliveryOptions = (id: number) =>
  queryOptions({
    queryKey: [...visitKeys.detail(id), 'report-delivery'] as const,
    queryFn: ({ signal }) => apiRequest<{ delivery: ReportDelivery | null }>(`${visitPath(id)}/report-delivery`, { signal }),
    refetchInterval: (query) => (['queued', 'sending'].includes(query.state.data?.delivery?.status ?? '') ? 3000 : false),
    staleTime: 0,
  });

export interface StepAnswerVars {
  stepId: string;
  body: StepAnswerInput;
}

/** PUT one step's answer; the server decides the branching and answers with the whole visit. */
export const putStepAnswer = (visitId: number, { stepId, body }: StepAnswerVars) =>
  apiRequest<VisitDetail>(`${visitPath(visitId)}/steps/${stepId}`, { method: 'PUT', body });

export interface SavedReading {
  reading: ReadingRecord;
  visit: VisitDetail;
}

/** POST one meter reading as typed; the server judges it again and its verdict is the one stored. */
export const postReading = (visitId: number, body: ReadingSaveInput) =>
  apiRequest<SavedReading>(`${visitPath(visitId)}/readings`, { method: 'POST', body });

/** Puts the server's answer on screen at once and lets the lists catch up in the background. */
function useStoreVisit() {
  const queryClient = useQueryClient();
  return (visit: VisitDetail) => {
    queryClient.setQueryData(visitKeys.detail(visit.id), visit);
    void queryClient.invalidateQueries({ queryKey: visitKeys.lists() });
  };
}

/** Opens a visit on a press; the server starts it at once and pins the procedure and bands. */
export function useCreateVisit() {
  const storeVisit = useStoreVisit();
  return useMutation({
    mutationFn: (input: VisitCreateInput) => apiRequest<VisitDetail>('/api/visits', { method: 'POST', body: input }),
    onSuccess: storeVisit,
  });
}

/** Takes a visit the manager returned back into work. */
export function useReopenVisit() {
  const storeVisit = useStoreVisit();
  return useMutation({
    mutationFn: (visitId: number) => apiRequest<VisitDetail>(`${visitPath(visitId)}/reopen`, { method: 'POST' }),
    onSuccess: storeVisit,
  });
}

/** Cancels an open visit started by mistake, with the reason; it stays on record, marked cancelled. */
export function useCancelVisit(visitId: number) {
  const storeVisit = useStoreVisit();
  return useMutation({
    mutationFn: (input: CancelVisitInput) => apiRequest<VisitDetail>(`${visitPath(visitId)}/cancel`, { method: 'POST', body: input }),
    onSuccess: storeVisit,
  });
}

/** POST /api/visits/:id/close. Part ids are made once on the tablet, so sending the same form again is safe. */
export function useCloseVisit(visitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: CloseOutInput) => {
      try {
        // An ended session holds the close-out until the person signs in again over the page.
        return await withSignIn(() => apiRequest<VisitDetail>(`${visitPath(visitId)}/close`, { method: 'POST', body: input }));
      } catch (error) {
        // The visit changed elsewhere: show it as it is now; the close-out stays as typed for the person to decide.
        if (isStaleVersion(error)) queryClient.setQueryData(visitKeys.detail(visitId), (error.current as StaleVersionCurrent).visit);
        throw error;
      }
    },
    onSuccess: (visit) => {
      queryClient.setQueryData(visitKeys.detail(visitId), visit);
      // Lists, tables and photos refresh in the background; the closed visit is on screen at once from the answer.
      void queryClient.invalidateQueries({ queryKey: visitKeys.all });
    },
  });
}
