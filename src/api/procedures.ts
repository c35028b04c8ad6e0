import { useMutation } from '@tanstack/react-query';
import type { ProcedureCheck, ProcedureImportInput, ProcedureSummary, ProcedureVersionRecord } from '@shared/schemas/admin-reference';
import { apiRequest } from '@/lib/api-client';
import { versionedRecordsApi } from './versioned-records';

/** Procedures, one family per key; a draft is an import of the JSON (it replaces an earlier draft). */
export const proceduresApi = versionedRecordsApi<ProcedureSummary[], ProcedureVersionRecord, ProcedureImportInput>('procedures', (input) => ({ path: '', body: input }));
export const procedureKeys = proceduresApi.keys;

/** Runs the server's validator and lays out the diagram; nothing is stored. */
export const useCheckProcedure = () =>
  useMutation({
    mutationFn: (definition: unknown) => apiRequest<ProcedureCheck>('/api/admin/procedures/check', { method: 'POST', body: { definition } }),
  });
