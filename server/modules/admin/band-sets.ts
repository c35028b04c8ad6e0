import { bandSetDraftSchema, type BandSetGeneration, type BandSetVersionRecord } from '../../../shared/schemas/admin-reference';
import { generationKeySchema } from '../../../shared/schemas/band-set';
import { AppError } from '../../lib/errors';
import { BandSetVersion } from '../reference/reference.model';
import { versionInfo, type VersionedResource } from '../../lib/versioned-records/versioned-service';

const toRecord = (b: BandSetVersion): BandSetVersionRecord => ({ ...versionInfo(b), generation: b.generation, label: b.label, bands: b.bands });

/** Band sets: one family per sensor generation; a draft starts as a copy of the generation's current version. */
export const bandSets: VersionedResource<BandSetVersion, BandSetVersionRecord, BandSetGeneration, never, typeof bandSetDraftSchema> = {
  model: BandSetVersion,
  what: 'The band set',
  audit: 'band_set',
  family: { column: 'generation', path: 'generations', schema: generationKeySchema },
  familyName: (generation) => `Generation ${generation}`,
  toRecord,
  list: {
    item: ({ family, rows, current, draft }) => ({
      generation: family!,
      current: current ? toRecord(current) : null,
      draft: draft ? toRecord(draft) : null,
      versions: rows.map((r) => ({ ...versionInfo(r), label: r.label })),
    }),
  },
  draft: {
    copy: (current, generation) => {
      if (!current) throw new AppError(404, 'not_found', `Generation ${generation} has no published band set to start a draft from.`);
      return { label: current.label, bands: current.bands };
    },
  },
  save: { schema: bandSetDraftSchema, content: ({ bands }) => ({ bands, label: bands.label }) },
};
