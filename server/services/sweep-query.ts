/**
 * SQL for the paged results and designs of a sweep. Only whitelisted columns reach the SQL text (from
 * shared/sweep/columns.ts); every value is a bound parameter. Ties sort by the row's index so pages are stable.
 */
import type { ColumnDef } from '../../shared/sweep/columns.ts';
import type { ResultsQuery } from '../../shared/sweep/results-query.ts';

export interface BuiltQuery {
  where: string;
  order: string;
  params: unknown[];
}

export function buildQuery(sweepId: string, q: ResultsQuery, columns: ColumnDef[], keyColumn: string): BuiltQuery {
  const byField = new Map(columns.map((c) => [c.field, c]));
  const params: unknown[] = [sweepId];
  const conds = ['sweep_id = $1'];
  const bind = (v: unknown) => {
    params.push(v);
    return `$${params.length}`;
  };
  if (q.designIndex !== null) conds.push(`design_index = ${bind(q.designIndex)}`);
  for (const f of q.filters) {
    const col = byField.get(f.field)!.column;
    if (f.eq !== undefined) conds.push(`${col} = ${bind(f.eq)}`);
    if (f.min !== undefined) conds.push(`${col} >= ${bind(f.min)}`);
    if (f.max !== undefined) conds.push(`${col} <= ${bind(f.max)}`);
  }
  const sort = q.sort ? byField.get(q.sort.field) : undefined;
  // NULLS LAST both ways: rows without a value (e.g. no side lobe) never crowd the first page.
  const order = sort && sort.column !== keyColumn
    ? `${sort.column} ${q.sort!.dir === 'desc' ? 'DESC' : 'ASC'} NULLS LAST, ${keyColumn}`
    : `${keyColumn} ${q.sort?.dir === 'desc' ? 'DESC' : 'ASC'}`;
  return { where: conds.join(' AND '), order, params };
}
