import type { Model, ModelStatic, Transaction, WhereOptions } from 'sequelize';
import { AppError, notFound } from '../../lib/errors';

interface Versioned {
  id: number;
  version: number;
  publishedAt: Date | null;
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);
export const versionInfo = (row: Versioned & { createdAt: Date }) => ({ id: row.id, version: row.version, publishedAt: iso(row.publishedAt), createdAt: row.createdAt.toISOString() });

export async function findVersion<M extends Model & Versioned>(model: ModelStatic<M>, id: number, what: string, transaction?: Transaction): Promise<M> {
  const row = await model.findByPk(id, { transaction });
  if (!row) throw notFound(`${what} ${id}`);
  return row;
}

/** Published versions may be pinned by visits, so only a draft is ever changed or discarded. */
export function assertDraft(row: Versioned, what: string): void {
  if (row.publishedAt) {
    throw new AppError(409, 'already_published', `${what} version ${row.version} is published and cannot be changed. Create a new draft from it instead.`);
  }
}

/** Sets publishedAt once; a second publish, even a concurrent one, answers 409. */
export async function publishVersion<M extends Model & Versioned>(model: ModelStatic<M>, row: M, what: string, transaction?: Transaction): Promise<void> {
  assertDraft(row, what);
  const [count] = await model.update({ publishedAt: new Date() } as never, { where: { id: row.id, publishedAt: null } as WhereOptions, transaction });
  if (count !== 1) throw new AppError(409, 'already_published', `${what} version ${row.version} was published already.`);
}

export async function discardDraft(row: Model & Versioned, what: string, transaction?: Transaction): Promise<void> {
  assertDraft(row, what);
  await row.destroy({ transaction });
}

export const draftExists = (what: string, version: number) =>
  new AppError(409, 'draft_exists', `${what} already has a draft (version ${version}). Edit or discard that draft first.`);
