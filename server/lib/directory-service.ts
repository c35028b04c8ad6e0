import type { Page, PageQuery } from '../../shared/schemas/common';
import { withConstraintMessages } from './db-errors';
import { notFound } from './errors';
import { toPage } from './paging';

interface DirectorySpec<Row extends { id: number }, Dto, Query extends PageQuery, Input, Update> {
  /** The noun in a 404 ("Customer 12"). */
  what: string;
  repository: {
    list: (q: Query) => Promise<{ rows: Row[]; count: number }>;
    find: (id: number) => Promise<Row | null>;
    insert: (input: Input) => Promise<Row>;
    save: (row: Row, input: Update) => Promise<Row>;
  };
  toDto: (row: Row) => Dto;
  /** What a unique or foreign-key violation means to the person who typed the record. */
  messages: { unique: string; foreignKey?: string };
  /**
   * Read the row again after a write: a site or a press answers with the names of the records it
   * belongs to, which only `find` joins.
   */
  rereadAfterWrite?: boolean;
}

/** The search/get/create/update service of a directory record (customers, sites, presses). */
export function directoryService<Row extends { id: number }, Dto, Query extends PageQuery, Input, Update>(
  spec: DirectorySpec<Row, Dto, Query, Input, Update>,
) {
  const { what, toDto, messages, rereadAfterWrite = false } = spec;
  const { list, find, insert, save } = spec.repository;

  async function found(id: number): Promise<Row> {
    const row = await find(id);
    if (!row) throw notFound(`${what} ${id}`);
    return row;
  }
  const answer = async (row: Row): Promise<Dto> => toDto(rereadAfterWrite ? await found(row.id) : row);

  return {
    search: async (q: Query): Promise<Page<Dto>> => {
      const { rows, count } = await list(q);
      return toPage(rows.map(toDto), count, q);
    },
    get: async (id: number): Promise<Dto> => toDto(await found(id)),
    create: async (input: Input): Promise<Dto> => answer(await withConstraintMessages(() => insert(input), messages)),
    update: async (id: number, input: Update): Promise<Dto> => {
      const row = await found(id);
      return answer(await withConstraintMessages(() => save(row, input), messages));
    },
  };
}

/** A row's two timestamps as the API sends them. */
export function isoTimestamps(row: { createdAt: Date; updatedAt: Date }): { createdAt: string; updatedAt: string } {
  return { createdAt: row.createdAt.toISOString(), updatedAt: row.updatedAt.toISOString() };
}
