import type { FirmwareRuleSetRecord, FirmwareRuleSets } from '../../../shared/schemas/admin-reference';
import type { FirmwareRule } from '../../../shared/schemas/firmware-rule';
import type { SessionUser } from '../../../shared/schemas/session';
import { withConstraintMessages } from '../../lib/db-errors';
import { AppError } from '../../lib/errors';
import { audit } from '../audit/audit';
import { FirmwareRuleSet } from '../reference/reference.model';
import { assertDraft, discardDraft, draftExists, findVersion, publishVersion, versionInfo } from './versioning';

const WHAT = 'The firmware rule set';

const toRecord = (r: FirmwareRuleSet): FirmwareRuleSetRecord => ({ ...versionInfo(r), rules: r.rules });

export async function listFirmwareRuleSets(): Promise<FirmwareRuleSets> {
  const rows = await FirmwareRuleSet.findAll({ order: [['version', 'DESC']] });
  const current = rows.find((r) => r.publishedAt !== null);
  const draft = rows.find((r) => r.publishedAt === null);
  return {
    current: current ? toRecord(current) : null,
    draft: draft ? toRecord(draft) : null,
    versions: rows.map((r) => ({ ...versionInfo(r), ruleCount: r.rules.length })),
  };
}

export async function getFirmwareRuleSet(id: number): Promise<FirmwareRuleSetRecord> {
  return toRecord(await findVersion(FirmwareRuleSet, id, WHAT));
}

/** A draft starts as a copy of the newest published rules (or empty when there are none yet). */
export function draftFirmwareRules(actor: SessionUser): Promise<FirmwareRuleSetRecord> {
  // The one-draft index answers a second, simultaneous request.
  return withConstraintMessages(() => FirmwareRuleSet.sequelize!.transaction(async (transaction) => {
    const rows = await FirmwareRuleSet.findAll({ order: [['version', 'DESC']], transaction });
    const draft = rows.find((r) => r.publishedAt === null);
    if (draft) throw draftExists('The firmware rules', draft.version);
    const current = rows.find((r) => r.publishedAt !== null);
    const created = await FirmwareRuleSet.create({ version: (rows[0]?.version ?? 0) + 1, rules: current?.rules ?? [], publishedAt: null, createdBy: actor.id }, { transaction });
    await audit({ visitId: null, actorId: actor.id, action: 'firmware_rules_drafted', detail: { version: created.version, from: current?.version ?? null } }, transaction);
    return toRecord(created);
  }), { unique: 'The firmware rules already have a draft. Reload the page to see it.' });
}

export async function saveFirmwareRulesDraft(id: number, rules: FirmwareRule[]): Promise<FirmwareRuleSetRecord> {
  const row = await findVersion(FirmwareRuleSet, id, WHAT);
  assertDraft(row, WHAT);
  await row.update({ rules });
  return toRecord(row);
}

export async function publishFirmwareRules(actor: SessionUser, id: number): Promise<FirmwareRuleSetRecord> {
  return FirmwareRuleSet.sequelize!.transaction(async (transaction) => {
    const row = await findVersion(FirmwareRuleSet, id, WHAT, transaction);
    if (row.publishedAt === null && row.rules.length === 0) {
      throw new AppError(409, 'empty_rules', 'This draft has no rules. Add at least one rule before publishing, or discard the draft.');
    }
    await publishVersion(FirmwareRuleSet, row, WHAT, transaction);
    await audit({ visitId: null, actorId: actor.id, action: 'firmware_rules_published', detail: { version: row.version } }, transaction);
    await row.reload({ transaction });
    return toRecord(row);
  });
}

export async function discardFirmwareRules(actor: SessionUser, id: number): Promise<void> {
  const row = await findVersion(FirmwareRuleSet, id, WHAT);
  await discardDraft(row, WHAT);
  await audit({ visitId: null, actorId: actor.id, action: 'firmware_rules_discarded', detail: { version: row.version } });
}
