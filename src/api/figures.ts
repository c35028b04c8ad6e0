import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { ManagerFigures } from '@shared/schemas/manager-figures';
import { apiRequest } from '@/lib/api-client';

/** The dashboard's request as it sits in the address. */
export type FiguresRequest = Record<string, string | undefined>;

export const figureKeys = {
  all: ['figures'] as const,
  summary: (request: FiguresRequest) => [...figureKeys.all, request] as const,
};

export const figuresOptions = (request: FiguresRequest) =>
  queryOptions({
    queryKey: figureKeys.summary(request),
    queryFn: ({ signal }) => apiRequest<ManagerFigures>('/api/manager/figures', { query: request, signal }),
    placeholderData: keepPreviousData,
  });
