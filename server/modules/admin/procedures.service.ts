import type { ProcedureCheck, ProcedureImportInput, ProcedureSummary, ProcedureVersionRecord } from '../../../shared/schemas/admin-reference';
import { procedureDefinitionSchema } from '../../../shared/schemas/procedure';
import type { SessionUser } from '../../../shared/schemas/session';
import { validateProcedure } from '../../../shared/domain/validate-procedure';
import { AppError } from '../../lib/errors';
import { audit } from '../audit/audit';
import { ProcedureVersion } from '../reference/reference.model';
import { procedureDiagram } from './procedure-diagram';
import { discardDraft, findVersion, publishVersion, versionInfo } from './versioning';

const WHAT = 'The procedure';

const toRecord = (p: ProcedureVersion): ProcedureVersionRecord => ({
  ...versionInfo(p),
  key: p.key,
  title: p.title,
  definition: p.definition,
  diagram: procedureDiagram(p.definition),
});

/** Runs the validator; the diagram is drawn whenever the JSON has the shape of a procedure, so a broken branch can be seen. */
export function checkProcedure(definition: unknown): ProcedureCheck {
  const result = validateProcedure(definition);
  const shaped = procedureDefinitionSchema.safeParse(definition);
  return {
    ok: result.ok,
    problems: result.ok ? [] : result.problems,
    diagram: shaped.success ? procedureDiagram(shaped.data) : null,
  };
}

/** The answer to a procedure that fails the validator: nothing is saved and every problem is listed. */
export function rejection(check: ProcedureCheck) {
  const n = check.problems.length;
  const message = `Nothing was saved: the procedure has ${n} problem${n === 1 ? '' : 's'}. Fix ${n === 1 ? 'it' : 'them'} in the JSON and import again.`;
  return { error: { code: 'procedure_invalid', message }, ...check };
}

export async function listProcedures(): Promise<ProcedureSummary[]> {
  const rows = await ProcedureVersion.findAll({ attributes: { exclude: ['definition'] }, order: [['key', 'ASC'], ['version', 'DESC']] });
  const keys = [...new Set(rows.map((r) => r.key))];
  return keys.map((key) => {
    const mine = rows.filter((r) => r.key === key).map((r) => ({ ...versionInfo(r), title: r.title }));
    const current = mine.find((r) => r.publishedAt !== null) ?? null;
    return { key, title: (current ?? mine[0]!).title, current, draft: mine.find((r) => r.publishedAt === null) ?? null, versions: mine };
  });
}

export async function getProcedure(id: number): Promise<ProcedureVersionRecord> {
  return toRecord(await findVersion(ProcedureVersion, id, WHAT));
}

/** Keeps a valid import as the key's draft: the next version number, replacing an earlier draft. */
export async function importProcedure(actor: SessionUser, input: ProcedureImportInput): Promise<ProcedureVersionRecord | ProcedureCheck> {
  const result = validateProcedure(input.definition);
  if (!result.ok) return checkProcedure(input.definition);
  return ProcedureVersion.sequelize!.transaction(async (transaction) => {
    const latest = await ProcedureVersion.findOne({ where: { key: input.key }, order: [['version', 'DESC']], transaction, lock: transaction.LOCK.UPDATE });
    let row: ProcedureVersion;
    if (latest && latest.publishedAt === null) {
      row = await latest.update({ title: input.title, definition: result.definition, createdBy: actor.id }, { transaction });
    } else {
      row = await ProcedureVersion.create(
        { key: input.key, version: (latest?.version ?? 0) + 1, title: input.title, definition: result.definition, publishedAt: null, createdBy: actor.id },
        { transaction },
      );
    }
    await audit({ visitId: null, actorId: actor.id, action: 'procedure_imported', detail: { key: row.key, version: row.version } }, transaction);
    return toRecord(row);
  });
}

export async function publishProcedure(actor: SessionUser, id: number): Promise<ProcedureVersionRecord> {
  return ProcedureVersion.sequelize!.transaction(async (transaction) => {
    const row = await findVersion(ProcedureVersion, id, WHAT, transaction);
    // Stored drafts passed the validator on import; check again so a rule added since then still holds.
    const check = checkProcedure(row.definition);
    if (!check.ok) throw new AppError(409, 'procedure_invalid', `This draft no longer passes the validator: ${check.problems.map((p) => p.message).join(' ')}`);
    await publishVersion(ProcedureVersion, row, WHAT, transaction);
    await audit({ visitId: null, actorId: actor.id, action: 'procedure_published', detail: { key: row.key, version: row.version } }, transaction);
    await row.reload({ transaction });
    return toRecord(row);
  });
}

export async function discardProcedure(actor: SessionUser, id: number): Promise<void> {
  const row = await findVersion(ProcedureVersion, id, WHAT);
  await discardDraft(row, WHAT);
  await audit({ visitId: null, actorId: actor.id, action: 'procedure_discarded', detail: { key: row.key, version: row.version } });
}
