import type { Page, PageQuery } from '../../shared/schemas/common';

export function pageWindow(q: PageQuery): { limit: number; offset: number } {
  return { limit: q.pageSize, offset: (q.page - 1) * q.pageSize };
}

export function toPage<T>(items: T[], total: number, q: PageQuery): Page<T> {
  return { items, total, page: q.page, pageSize: q.pageSize };
}

/** Escapes LIKE wildcards so a search for "50%" finds the text "50%". */
export function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
