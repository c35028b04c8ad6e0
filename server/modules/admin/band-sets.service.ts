import type { BandSetGeneration, BandSetVersionRecord } from '../../../shared/schemas/admin-reference';
import type { BandSetValues } from '../../../shared/schemas/band-set';
import type { SessionUser } from '../../../shared/schemas/session';
import { withConstraintMessages } from '../../lib/db-errors';
import { AppError } from '../../lib/errors';
import { audit } from '../audit/audit';
import { BandSetVersion } from '../reference/reference.model';
import { assertDraft, discardDraft, draftExists, findVersion, publishVersion, versionInfo } from './versioning';

const WHAT = 'The band set';

export const toBandSetRecord = (b: BandSetVersion): BandSetVersionRecord => ({ ...versionInfo(b), generation: b.generation, label: b.label, bands: b.bands });

export async function listBandSetGenerations(): Promise<BandSetGeneration[]> {
  const rows = await BandSetVersion.findAll({ order: [['generation', 'ASC'], ['version', 'DESC']] });
  const generations = [...new Set(rows.map((r) => r.generation))];
  return generations.map((generation) => {
    const mine = rows.filter((r) => r.generation === generation);
    const current = mine.find((r) => r.publishedAt !== null);
    const draft = mine.find((r) => r.publishedAt === null);
    return {
      generation,
      current: current ? toBandSetRecord(current) : null,
      draft: draft ? toBandSetRecord(draft) : null,
      versions: mine.map((r) => ({ ...versionInfo(r), label: r.label })),
    };
  });
}

export async function getBandSet(id: number): Promise<BandSetVersionRecord> {
  return toBandSetRecord(await findVersion(BandSetVersion, id, WHAT));
}

/** A draft starts as a copy of the newest published version of the generation. */
export function draftBandSet(actor: SessionUser, generation: string): Promise<BandSetVersionRecord> {
  // The one-draft index answers a second, simultaneous request.
  return withConstraintMessages(() => BandSetVersion.sequelize!.transaction(async (transaction) => {
    const rows = await BandSetVersion.findAll({ where: { generation }, order: [['version', 'DESC']], transaction });
    const draft = rows.find((r) => r.publishedAt === null);
    if (draft) throw draftExists(`Generation ${generation}`, draft.version);
    const current = rows.find((r) => r.publishedAt !== null);
    if (!current) throw new AppError(404, 'not_found', `Generation ${generation} has no published band set to start a draft from.`);
    const created = await BandSetVersion.create(
      { generation, version: rows[0]!.version + 1, label: current.label, bands: current.bands, publishedAt: null, createdBy: actor.id },
      { transaction },
    );
    await audit({ visitId: null, actorId: actor.id, action: 'band_set_drafted', detail: { generation, version: created.version, from: current.version } }, transaction);
    return toBandSetRecord(created);
  }), { unique: 'That generation already has a draft. Reload the page to see it.' });
}

export async function saveBandSetDraft(id: number, bands: BandSetValues): Promise<BandSetVersionRecord> {
  const row = await findVersion(BandSetVersion, id, WHAT);
  assertDraft(row, WHAT);
  await row.update({ bands, label: bands.label });
  return toBandSetRecord(row);
}

export async function publishBandSet(actor: SessionUser, id: number): Promise<BandSetVersionRecord> {
  return BandSetVersion.sequelize!.transaction(async (transaction) => {
    const row = await findVersion(BandSetVersion, id, WHAT, transaction);
    await publishVersion(BandSetVersion, row, WHAT, transaction);
    await audit({ visitId: null, actorId: actor.id, action: 'band_set_published', detail: { generation: row.generation, version: row.version } }, transaction);
    await row.reload({ transaction });
    return toBandSetRecord(row);
  });
}

export async function discardBandSet(actor: SessionUser, id: number): Promise<void> {
  const row = await findVersion(BandSetVersion, id, WHAT);
  await discardDraft(row, WHAT);
  await audit({ visitId: null, actorId: actor.id, action: 'band_set_discarded', detail: { generation: row.generation, version: row.version } });
}
