import type Database from 'better-sqlite3';

/** One table's rows for an export: a SELECT over the listed columns, bound to the scope's ids. */
export interface TableQuery {
  table: string;
  columns: string[];
  sql: string;
  /** The WHERE condition alone (for an UPDATE over the same rows) and the ids it binds. */
  where: string;
  params: number[];
}

export type ExportScope = { kind: 'shop'; shopId: number } | { kind: 'customer'; shopId: number; customerId: number };

/** Never exported: sign-in sessions, the task queue, password and link-token hashes, mail bodies that may still hold a live owner link. */
const SKIP_TABLES = new Set(['sessions', 'tasks']);
const SKIP_COLUMNS = new Set(['password_hash', 'token_hash', 'text_body', 'html_body', 'sealed_secrets']);
/** Not in one customer's export: staff accounts and shop-wide records. */
const SHOP_ONLY = new Set(['users', 'shops', 'showcase_items']);

/** Record tables of the schema (with their columns), read from sqlite_master and PRAGMA table_info, so a new table is exported without a change here. */
export function recordTables(db: Database.Database, opts: { allColumns?: boolean } = {}): Map<string, string[]> {
  const names = db
    .prepare(
      `SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' AND name NOT LIKE '\\_\\_%' ESCAPE '\\' AND sql NOT LIKE 'CREATE VIRTUAL%' ORDER BY name`,
    )
    .pluck()
    .all() as string[];
  const out = new Map<string, string[]>();
  for (const name of names) {
    const cols = (db.prepare(`SELECT name FROM pragma_table_info(?)`).pluck().all(name) as string[]).filter((c) => opts.allColumns || !SKIP_COLUMNS.has(c));
    // FTS shadow tables and other helpers carry no shop: only tables that name a shop, or hang off one that does.
    const linked = cols.includes('shop_id') || name === 'shops' || cols.includes('finding_id') || (cols.includes('asset_id') && name !== 'shot_pairs');
    if (!SKIP_TABLES.has(name) && linked) out.set(name, cols);
  }
  return out;
}

/** The SELECT for each table in scope; every one is bound to the shop, a customer's also to that customer's bikes and jobs. */
export function exportQueries(db: Database.Database, scope: ExportScope, opts: { allColumns?: boolean } = {}): TableQuery[] {
  const out: TableQuery[] = [];
  const jobsOf = `SELECT id FROM jobs WHERE shop_id = ? AND customer_id = ?`;
  for (const [table, columns] of recordTables(db, opts)) {
    const select = `SELECT ${columns.map((c) => `"${c}"`).join(', ')} FROM "${table}"`;
    const where = scope.kind === 'shop' ? shopWhere(table, columns) : customerWhere(table, columns, jobsOf);
    if (!where) continue;
    const params =
      scope.kind === 'shop'
        ? where.binds.map(() => scope.shopId)
        : where.binds.flatMap((b) => (b === 'shop' ? [scope.shopId] : [scope.shopId, scope.customerId]));
    out.push({ table, columns, sql: `${select} WHERE ${where.sql} ORDER BY rowid`, where: where.sql, params });
  }
  return out;
}

type Where = { sql: string; binds: ('shop' | 'jobs')[] } | null;

function shopWhere(table: string, columns: string[]): Where {
  if (table === 'shops') return { sql: 'id = ?', binds: ['shop'] };
  if (columns.includes('shop_id')) return { sql: 'shop_id = ?', binds: ['shop'] };
  if (columns.includes('finding_id')) return { sql: 'finding_id IN (SELECT id FROM findings WHERE shop_id = ?)', binds: ['shop'] };
  return { sql: 'asset_id IN (SELECT id FROM media_assets WHERE shop_id = ?)', binds: ['shop'] };
}

function customerWhere(table: string, columns: string[], jobsOf: string): Where {
  if (SHOP_ONLY.has(table)) return null;
  if (table === 'customers') return { sql: 'shop_id = ? AND id = ?', binds: ['jobs'] };
  if (columns.includes('customer_id')) return { sql: 'shop_id = ? AND customer_id = ?', binds: ['jobs'] };
  if (table === 'audit_events')
    return {
      sql: `shop_id = ? AND ((entity_type = 'customer' AND entity_id = ?) OR (entity_type = 'job' AND entity_id IN (${jobsOf})))`,
      binds: ['jobs', 'jobs'],
    };
  if (columns.includes('job_id')) return { sql: `job_id IN (${jobsOf})`, binds: ['jobs'] };
  if (columns.includes('finding_id')) return { sql: `finding_id IN (SELECT id FROM findings WHERE job_id IN (${jobsOf}))`, binds: ['jobs'] };
  if (columns.includes('asset_id')) return { sql: `asset_id IN (SELECT id FROM media_assets WHERE job_id IN (${jobsOf}))`, binds: ['jobs'] };
  return null;
}
