import { readFileSync } from 'node:fs';
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import type { SessionUser } from '../../shared/schemas/session';
import { dropVersionedTableRulesSql, versionedColumnsSql, versionedTableRulesSql } from '../../server/db/versioned-table';
import { versionInfo, versionedService, type VersionedResource } from '../../server/lib/versioned-records/versioned-service';
import { makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();

// A made-up resource built the way a new one would be: a table per book of lines, versioned.
class TestList extends Model<InferAttributes<TestList>, InferCreationAttributes<TestList>> {
  declare id: CreationOptional<number>;
  declare book: string;
  declare version: number;
  declare lines: string[];
  declare publishedAt: Date | null;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const toRecord = (r: TestList) => ({ ...versionInfo(r), book: r.book, lines: r.lines });
const linesSchema = z.object({ lines: z.array(z.string()) });
const spec: VersionedResource<TestList, ReturnType<typeof toRecord>, { book: string; versions: number[] }, never, typeof linesSchema> = {
  model: TestList,
  what: 'The test list',
  audit: 'test_list',
  family: { column: 'book', path: 'books', schema: z.string() },
  familyName: (book) => `Book ${book}`,
  toRecord,
  list: { item: ({ family, rows }) => ({ book: family!, versions: rows.map((r) => r.version) }) },
  draft: { copy: (current) => ({ lines: current?.lines ?? [] }) },
  save: { schema: linesSchema, content: ({ lines }) => ({ lines }) },
};
let actor: SessionUser;
const service = () => versionedService(spec);

beforeAll(async () => {
  await db.sequelize.query(`CREATE TABLE test_lists (id serial PRIMARY KEY, book text NOT NULL, lines jsonb NOT NULL, ${versionedColumnsSql}, UNIQUE (book, version));
    ${versionedTableRulesSql('test_lists', ['book'])}`);
  TestList.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      book: DataTypes.TEXT,
      version: DataTypes.INTEGER,
      lines: DataTypes.JSONB,
      publishedAt: DataTypes.DATE,
      createdBy: DataTypes.INTEGER,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize: db.sequelize, tableName: 'test_lists' },
  );
  const user = await makeUser('admin');
  actor = { id: user.id, role: 'admin' } as SessionUser;
});

describe('versioned-records builder', () => {
  it('numbers versions per family, copies the published version into a draft, and freezes what it publishes', async () => {
    const first = await service().copyDraft(actor, 'a');
    expect(first).toMatchObject({ book: 'a', version: 1, publishedAt: null, lines: [] });
    await service().save(first.id, { lines: ['one'] });
    const published = await service().publish(actor, first.id);
    expect(published.publishedAt).not.toBeNull();
    await expect(service().save(first.id, { lines: ['two'] })).rejects.toMatchObject({ status: 409, code: 'already_published' });
    await expect(service().publish(actor, first.id)).rejects.toMatchObject({ status: 409 });
    await expect(service().discard(actor, first.id)).rejects.toMatchObject({ status: 409 });

    const second = await service().copyDraft(actor, 'a');
    expect(second).toMatchObject({ version: 2, lines: ['one'] });
    await expect(service().copyDraft(actor, 'a')).rejects.toMatchObject({ status: 409, code: 'draft_exists', message: expect.stringMatching(/^Book a already has a draft \(version 2\)/) });
    const other = await service().copyDraft(actor, 'b');
    expect(other.version).toBe(1);
    expect(await service().list()).toEqual([
      { book: 'a', versions: [2, 1] },
      { book: 'b', versions: [1] },
    ]);
    await service().discard(actor, other.id);
    const [actions] = (await db.sequelize.query(`SELECT action, detail FROM audit_events WHERE action LIKE 'test_list_%' ORDER BY id`)) as [{ action: string; detail: object }[], unknown];
    expect(actions.map((a) => a.action)).toEqual(['test_list_drafted', 'test_list_published', 'test_list_drafted', 'test_list_drafted', 'test_list_discarded']);
    expect(actions[2]!.detail).toEqual({ book: 'a', version: 2, from: 1 });
  });

  it('makes the database refuse to change or delete a published row, and a second draft in a family', async () => {
    await expect(db.sequelize.query(`UPDATE test_lists SET lines = '[]' WHERE book = 'a' AND version = 1`)).rejects.toThrow(/published and cannot be changed/);
    await expect(db.sequelize.query(`DELETE FROM test_lists WHERE book = 'a' AND version = 1`)).rejects.toThrow(/published and cannot be deleted/);
    await expect(db.sequelize.query(`INSERT INTO test_lists (book, version, lines) VALUES ('a', 3, '[]')`)).rejects.toMatchObject({
      name: 'SequelizeUniqueConstraintError',
      parent: expect.objectContaining({ constraint: 'test_lists_one_draft' }),
    });
  });

  it('writes the same rules the reference-data migrations wrote by hand for the three existing tables', () => {
    const migrations = ['20261201T2300.reference-data.ts', '20261202T0300.admin-invites-and-drafts.ts']
      .map((f) => readFileSync(new URL(`../../server/db/migrations/${f}`, import.meta.url), 'utf8'))
      .join('\n');
    const statements = [versionedTableRulesSql('procedures', ['key']), versionedTableRulesSql('band_sets', ['generation']), versionedTableRulesSql('firmware_rule_sets', [])].join('\n').split('\n');
    for (const statement of statements) expect(migrations).toContain(statement);
    expect(dropVersionedTableRulesSql('band_sets')).toContain('DROP TRIGGER IF EXISTS band_sets_keep_published ON band_sets;');
    expect(() => versionedTableRulesSql('x; DROP TABLE users', [])).toThrow(/identifier/);
  });
});
