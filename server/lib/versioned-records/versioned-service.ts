import type { CreationAttributes, Model, ModelStatic, Transaction, WhereOptions } from 'sequelize';
import type { z } from 'zod';
import type { VersionInfo } from '../../../shared/schemas/admin-reference';
import type { SessionUser } from '../../../shared/schemas/session';
import { withConstraintMessages } from '../db-errors';
import { AppError, notFound } from '../errors';
import { audit } from '../../modules/audit/audit';

// One pattern for every kind of versioned reference data: rows of a "family" (a band set's
// generation, a procedure's key, or the whole table) are numbered versions; at most one is an
// unpublished draft; a published row is frozen (the database enforces it too, see
// server/db/versioned-table.ts) because visits pin the version they ran with.

export interface VersionedRow {
  id: number;
  version: number;
  publishedAt: Date | null;
  createdBy: number | null;
  createdAt: Date;
}

/** The columns a resource owns (its content); version, family, publishedAt and createdBy are the builder's. */
export type Content<M extends Model> = Partial<CreationAttributes<M>>;

/** One family's rows, newest version first. */
export interface FamilyGroup<M> {
  family: string | null;
  rows: M[];
  /** The newest published version: what new visits pin. */
  current: M | undefined;
  draft: M | undefined;
}

/** A new draft is a copy of the family's newest published version (band sets, firmware rules). */
export interface CopyDraft<M extends Model> {
  copy: (current: M | undefined, family: string | null) => Content<M>;
}

/** A new draft comes in the request body and replaces the family's draft if there is one (procedure import). */
export interface BodyDraft<M extends Model, S extends z.ZodType> {
  schema: S;
  familyOf: (input: z.infer<S>) => string;
  /** Content to store, or the 422 answer that says why nothing was stored. */
  accept: (input: z.infer<S>) => { content: Content<M> } | { rejected: unknown };
  /** Audit verb; "drafted" unless said otherwise. */
  verb?: string;
}

export interface VersionedResource<M extends Model & VersionedRow, R, L, S extends z.ZodType = z.ZodType, P extends z.ZodType = z.ZodType> {
  model: ModelStatic<M>;
  /** How messages name one row: "The band set". */
  what: string;
  /** Audit actions are `${audit}_drafted`, `_published`, `_discarded`. */
  audit: string;
  /**
   * The column that groups versions. Copied drafts of a family are requested with
   * POST /<path>/:<column>/drafts. Without it the whole table is one family (POST /drafts).
   */
  family?: { column: string; path?: string; schema?: z.ZodType<string> };
  /** How messages name a family ("Generation g1"); by default `what`, followed by the family. */
  familyName?: (family: string | null) => string;
  toRecord: (row: M) => R;
  /** One list entry per family; `exclude` keeps large columns out of the list query. */
  list: { item: (group: FamilyGroup<M>) => L; exclude?: string[] };
  draft: CopyDraft<M> | BodyDraft<M, S>;
  /** PUT /:id edits a draft's content; omit when drafts are replaced by a new POST instead. */
  save?: { schema: P; content: (input: z.infer<P>) => Content<M> };
  /** A last check inside the publish transaction; throw AppError to refuse. */
  beforePublish?: (row: M) => void;
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);
export const versionInfo = (row: VersionedRow): VersionInfo => ({ id: row.id, version: row.version, publishedAt: iso(row.publishedAt), createdAt: row.createdAt.toISOString() });

/** Published versions may be pinned by visits, so only a draft is ever changed or discarded. */
function assertDraft(row: VersionedRow, what: string): void {
  if (row.publishedAt) {
    throw new AppError(409, 'already_published', `${what} version ${row.version} is published and cannot be changed. Create a new draft from it instead.`);
  }
}

export const isBodyDraft = <M extends Model, S extends z.ZodType>(draft: CopyDraft<M> | BodyDraft<M, S>): draft is BodyDraft<M, S> => 'schema' in draft;

/** The service behind a versioned resource: the routes call nothing else. */
export function versionedService<M extends Model & VersionedRow, R, L, S extends z.ZodType, P extends z.ZodType>(spec: VersionedResource<M, R, L, S, P>) {
  const { model, what, family } = spec;
  const column = family?.column;
  const familyOf = (row: M): string | null => (column ? (row.get(column) as string) : null);
  const familyDetail = (value: string | null) => (column ? { [column]: value } : {});
  const event = (actor: SessionUser, verb: string, row: M, extra: Record<string, unknown>, transaction: Transaction) =>
    audit({ visitId: null, actorId: actor.id, action: `${spec.audit}_${verb}`, detail: { ...familyDetail(familyOf(row)), version: row.version, ...extra } }, transaction);
  const familyName = spec.familyName ?? ((value: string | null) => (value === null ? what : `${what} ${value}`));
  const transaction = <T>(work: (t: Transaction) => Promise<T>) => model.sequelize!.transaction(work);

  /** Locks the row inside a write, so a concurrent publish or discard waits its turn. */
  async function find(id: number, t?: Transaction): Promise<M> {
    const row = await model.findByPk(id, { transaction: t, lock: t ? t.LOCK.UPDATE : undefined });
    if (!row) throw notFound(`${what} ${id}`);
    return row;
  }

  function group(value: string | null, rows: M[]): FamilyGroup<M> {
    return { family: value, rows, current: rows.find((r) => r.publishedAt !== null), draft: rows.find((r) => r.publishedAt === null) };
  }

  async function familyRows(value: string | null, t: Transaction): Promise<M[]> {
    return model.findAll({ where: (column ? { [column]: value } : {}) as WhereOptions, order: [['version', 'DESC']], transaction: t });
  }

  async function create(actor: SessionUser, value: string | null, version: number, content: Content<M>, t: Transaction): Promise<M> {
    return model.create({ ...familyDetail(value), ...content, version, publishedAt: null, createdBy: actor.id } as never, { transaction: t });
  }

  return {
    /** An array of families, or the one family's entry when the table is a single family. */
    async list(): Promise<L[] | L> {
      const order: [string, string][] = column ? [[column, 'ASC'], ['version', 'DESC']] : [['version', 'DESC']];
      const rows = await model.findAll({ attributes: spec.list.exclude ? { exclude: spec.list.exclude } : undefined, order });
      if (!column) return spec.list.item(group(null, rows));
      const values = [...new Set(rows.map(familyOf))];
      return values.map((value) => spec.list.item(group(value, rows.filter((r) => familyOf(r) === value))));
    },

    async get(id: number): Promise<R> {
      return spec.toRecord(await find(id));
    },

    /** A copy of the newest published version; a family has one draft at a time. */
    copyDraft(actor: SessionUser, value: string | null): Promise<R> {
      const { draft } = spec;
      if (isBodyDraft(draft)) throw new Error(`${what}: drafts come in the request body, not as copies`);
      // The one-draft index answers a second, simultaneous request.
      return withConstraintMessages(
        () =>
          transaction(async (t) => {
            const { rows, current, draft: existing } = group(value, await familyRows(value, t));
            if (existing) {
              throw new AppError(409, 'draft_exists', `${familyName(value)} already has a draft (version ${existing.version}). Edit or discard that draft first.`);
            }
            const created = await create(actor, value, (rows[0]?.version ?? 0) + 1, draft.copy(current, value), t);
            await event(actor, 'drafted', created, { from: current?.version ?? null }, t);
            return spec.toRecord(created);
          }),
        { unique: `${familyName(value)} already has a draft. Reload the page to see it.` },
      );
    },

    /** Stores the body as the family's draft: the next version number, or in place of an earlier draft. */
    async bodyDraft(actor: SessionUser, input: z.infer<S>): Promise<{ record: R } | { rejected: unknown }> {
      const { draft } = spec;
      if (!isBodyDraft(draft)) throw new Error(`${what}: drafts are copies of the published version, not request bodies`);
      const accepted = draft.accept(input);
      if ('rejected' in accepted) return accepted;
      const value = draft.familyOf(input);
      // Two first imports of a new family both make version 1; the unique index refuses the second.
      return withConstraintMessages(
        () =>
          transaction(async (t) => {
            // Locking the newest row serialises two imports into an existing family.
            const latest = await model.findOne({ where: (column ? { [column]: value } : {}) as WhereOptions, order: [['version', 'DESC']], transaction: t, lock: t.LOCK.UPDATE });
            const row =
              latest && latest.publishedAt === null
                ? await latest.update({ ...accepted.content, createdBy: actor.id } as never, { transaction: t })
                : await create(actor, value, (latest?.version ?? 0) + 1, accepted.content, t);
            await event(actor, draft.verb ?? 'drafted', row, {}, t);
            return { record: spec.toRecord(row) };
          }),
        { unique: `${familyName(value)} was changed at the same moment. Reload the page to see it, then try again.` },
      );
    },

    async save(id: number, content: Content<M>): Promise<R> {
      return transaction(async (t) => {
        const row = await find(id, t);
        assertDraft(row, what);
        await row.update(content as never, { transaction: t });
        return spec.toRecord(row);
      });
    },

    /** Sets publishedAt once; a second publish, even a concurrent one, answers 409. */
    async publish(actor: SessionUser, id: number): Promise<R> {
      return transaction(async (t) => {
        const row = await find(id, t);
        assertDraft(row, what);
        spec.beforePublish?.(row);
        const [count] = await model.update({ publishedAt: new Date() } as never, { where: { id: row.id, publishedAt: null } as WhereOptions, transaction: t });
        if (count !== 1) throw new AppError(409, 'already_published', `${what} version ${row.version} was published already.`);
        await event(actor, 'published', row, {}, t);
        await row.reload({ transaction: t });
        return spec.toRecord(row);
      });
    },

    async discard(actor: SessionUser, id: number): Promise<void> {
      await transaction(async (t) => {
        const row = await find(id, t);
        assertDraft(row, what);
        await row.destroy({ transaction: t });
        await event(actor, 'discarded', row, {}, t);
      });
    },
  };
}
