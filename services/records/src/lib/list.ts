import type { Knex } from 'knex';

export interface ListParams {
  limit: number;
  offset: number;
  sort?: string;
  q?: string;
}

export interface ListPage<T> {
  items: T[];
  total: number;
  limit: number;
  offset: number;
}

/**
 * One page of a table: text filter over `searchColumns`, sort by an API field mapped to a column
 * (the API names are validated before they get here), id as the tie-breaker so pages are stable.
 */
export async function listPage<Row, Item>(
  query: Knex.QueryBuilder,
  params: ListParams,
  options: {
    columns: Record<string, string>;
    searchColumns: string[];
    defaultSort: string;
    toItem: (row: Row) => Item;
  },
): Promise<ListPage<Item>> {
  let filtered = query.clone();
  if (params.q) {
    const like = `%${params.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    filtered = filtered.where((w) => {
      // lower() on both sides: SQLite's LIKE ignores case, PostgreSQL's does not. `??` quotes the
      // column, as PostgreSQL reserves some names (`to`).
      for (const column of options.searchColumns) w.orWhereRaw(`lower(??) LIKE lower(?) ESCAPE '\\'`, [column, like]);
    });
  }
  const countRow = (await filtered.clone().clearSelect().clearOrder().count({ n: '*' }).first()) as { n: number } | undefined;
  const sort = params.sort ?? options.defaultSort;
  const descending = sort.startsWith('-');
  const column = options.columns[descending ? sort.slice(1) : sort] ?? 'id';
  const rows = (await filtered
    // Empty values sort as the smallest on both databases (SQLite's way; PostgreSQL's is the largest).
    .orderByRaw(`(?? is null) ${descending ? 'asc' : 'desc'}`, [column])
    .orderBy([
      { column, order: descending ? 'desc' : 'asc' },
      { column: 'id', order: 'asc' },
    ])
    .limit(params.limit)
    .offset(params.offset)) as Row[];
  return { items: rows.map(options.toItem), total: Number(countRow?.n ?? 0), limit: params.limit, offset: params.offset };
}
