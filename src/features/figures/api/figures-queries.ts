import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { ManagerFigures, PressHistory } from '@shared/schemas/manager-figures';
import { apiRequest } from '@/lib/api-client';

export type FiguresRequest = Record<string, string | undefined>;

export const figuresKeys = {
  figures: (request: FiguresRequest) => ['figures', request] as const,
  pressHistory: (pressId: number) => ['presses', 'history', pressId] as const,
};

export const figuresOptions = (request: FiguresRequest) =>
  queryOptions({
    queryKey: figuresKeys.figures(request),
    queryFn: ({ signal }) => apiRequest<ManagerFigures>('/api/manager/figures', { query: request, signal }),
    placeholderData: keepPreviousData,
  });

export const pressHistoryOptions = (pressId: number) =>
  queryOptions({
    queryKey: figuresKeys.pressHistory(pressId),
    queryFn: ({ signal }) => apiRequest<PressHistory>(`/api/manager/presses/${pressId}/history`, { signal }),
  });
