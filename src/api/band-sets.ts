import type { BandSetDraftInput, BandSetGeneration, BandSetVersionRecord } from '@shared/schemas/admin-reference';
import { versionedRecordsApi } from './versioned-records';

/** Band sets, one family per sensor generation; a draft is started for a generation. */
export const bandSetsApi = versionedRecordsApi<BandSetGeneration[], BandSetVersionRecord, string, BandSetDraftInput>('band-sets', (generation) => ({
  path: `/generations/${encodeURIComponent(generation)}/drafts`,
}));
export const bandSetKeys = bandSetsApi.keys;
