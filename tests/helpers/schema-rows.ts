/**
 * Representative rows for whatever schema a database holds, read from information_schema: every
 * column gets a value of its type (enums their first member, JSON an object, dates, numbers, text
 * within its length), foreign keys point at rows of the referenced table (tables filled parents
 * first), unique columns get distinct values. Used by the migration upgrade test.
 */
import type mysql from "mysql2/promise";

type Column = { name: string; type: string; columnType: string; maxLength: number | null; nullable: boolean; autoIncrement: boolean; generated: boolean };
type ForeignKey = { table: string; columns: string[]; refTable: string; refColumns: string[] };
export type Snapshot = Record<string, Map<string, Record<string, string | null>>>;

const q = (name: string) => `\`${name.replace(/`/g, "``")}\``;

async function rows<T>(conn: mysql.Connection, sql: string, params: unknown[] = []): Promise<T[]> {
  return (await conn.query(sql, params))[0] as T[];
}

async function tables(conn: mysql.Connection): Promise<string[]> {
  return (await rows<{ t: string }>(conn, "SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE' ORDER BY 1")).map((r) => r.t);
}

async function primaryKeys(conn: mysql.Connection): Promise<Record<string, string[]>> {
  const out: Record<string, string[]> = {};
  const list = await rows<{ t: string; c: string }>(
    conn,
    "SELECT table_name AS t, column_name AS c FROM information_schema.key_column_usage WHERE table_schema = DATABASE() AND constraint_name = 'PRIMARY' ORDER BY table_name, ordinal_position",
  );
  for (const r of list) (out[r.t] ??= []).push(r.c);
  return out;
}

/** Every row of every table keyed by its primary key, values as text (so that types compare plainly). */
export async function snapshot(conn: mysql.Connection): Promise<Snapshot> {
  const pks = await primaryKeys(conn);
  const out: Snapshot = {};
  for (const t of await tables(conn)) {
    const map = new Map<string, Record<string, string | null>>();
    for (const row of await rows<Record<string, unknown>>(conn, `SELECT * FROM ${q(t)}`)) {
      const text = Object.fromEntries(Object.entries(row).map(([k, v]) => [k, v === null ? null : Buffer.isBuffer(v) ? v.toString("hex") : typeof v === "object" ? JSON.stringify(v) : String(v)]));
      const key = (pks[t] ?? Object.keys(row)).map((c) => text[c]).join("|");
      map.set(key, text);
    }
    out[t] = map;
  }
  return out;
}

function valueFor(col: Column, tag: string, n: number): unknown {
  const unique = `${tag}-${n}`;
  switch (col.type) {
    case "enum":
    case "set":
      return /'((?:[^']|'')*)'/.exec(col.columnType)?.[1]?.replace(/''/g, "'") ?? "";
    case "tinyint":
      return col.columnType.startsWith("tinyint(1)") ? n % 2 : (n % 100) + 1;
    case "smallint":
    case "mediumint":
    case "int":
    case "bigint":
      return 1000 + Number(tag.replace(/\D/g, "") || 0) * 100 + n;
    case "decimal":
    case "float":
    case "double":
      return 1.5 + n;
    case "date":
      return `2026-01-${String(10 + n).padStart(2, "0")}`;
    case "datetime":
    case "timestamp":
      return `2026-01-${String(10 + n).padStart(2, "0")} 08:30:00`;
    case "year":
      return 2026;
    case "json":
    case "longtext":
      // MariaDB stores JSON as longtext with a json_valid check
      return JSON.stringify({ generated: unique });
    case "binary":
    case "varbinary":
    case "blob":
    case "tinyblob":
    case "mediumblob":
    case "longblob":
      return Buffer.from(unique);
    default: {
      const text = `${unique}-${col.name}`;
      const max = col.maxLength ?? 60;
      return text.length <= max ? text : `${unique}`.slice(-max);
    }
  }
}

/**
 * Inserts `perTable` rows into every table, parents before children; returns the inserts that
 * failed (a constraint the generator does not know), so that a test can name them.
 */
export async function fillEveryTable(conn: mysql.Connection, tag: string, perTable = 2): Promise<{ problems: string[] }> {
  const cols = await rows<{ t: string; c: string; dt: string; ct: string; len: number | null; nul: string; extra: string }>(
    conn,
    `SELECT table_name AS t, column_name AS c, data_type AS dt, column_type AS ct, character_maximum_length AS len, is_nullable AS nul, extra
       FROM information_schema.columns WHERE table_schema = DATABASE() ORDER BY table_name, ordinal_position`,
  );
  const columns: Record<string, Column[]> = {};
  for (const c of cols) {
    (columns[c.t] ??= []).push({ name: c.c, type: c.dt.toLowerCase(), columnType: c.ct.toLowerCase(), maxLength: c.len, nullable: c.nul === "YES", autoIncrement: /auto_increment/i.test(c.extra), generated: /generated/i.test(c.extra) });
  }
  const fkRows = await rows<{ n: string; t: string; c: string; rt: string; rc: string }>(
    conn,
    `SELECT constraint_name AS n, table_name AS t, column_name AS c, referenced_table_name AS rt, referenced_column_name AS rc
       FROM information_schema.key_column_usage WHERE table_schema = DATABASE() AND referenced_table_name IS NOT NULL ORDER BY constraint_name, ordinal_position`,
  );
  const fks = new Map<string, ForeignKey>();
  for (const r of fkRows) {
    const fk = fks.get(`${r.t}.${r.n}`) ?? { table: r.t, columns: [], refTable: r.rt, refColumns: [] };
    fk.columns.push(r.c);
    fk.refColumns.push(r.rc);
    fks.set(`${r.t}.${r.n}`, fk);
  }
  // parents first (Kahn); a self reference is left NULL
  const order: string[] = [];
  const pending = new Set(Object.keys(columns).filter((t) => t !== "__drizzle_migrations"));
  while (pending.size) {
    const ready = [...pending].filter((t) => [...fks.values()].every((fk) => fk.table !== t || fk.refTable === t || !pending.has(fk.refTable)));
    if (!ready.length) throw new Error(`foreign keys form a cycle among ${[...pending].join(", ")}`);
    for (const t of ready.sort()) {
      order.push(t);
      pending.delete(t);
    }
  }
  const problems: string[] = [];
  for (const table of order) {
    const own = [...fks.values()].filter((fk) => fk.table === table);
    for (let n = 1; n <= perTable; n++) {
      const values: Record<string, unknown> = {};
      for (const col of columns[table]!) {
        if (col.autoIncrement || col.generated) continue;
        values[col.name] = valueFor(col, tag, n);
      }
      for (const fk of own) {
        if (fk.refTable === table) {
          for (const c of fk.columns) values[c] = null;
          continue;
        }
        const parents = await rows<Record<string, unknown>>(conn, `SELECT ${fk.refColumns.map(q).join(", ")} FROM ${q(fk.refTable)} ORDER BY 1 DESC LIMIT ${perTable}`);
        const parent = parents[(n - 1) % Math.max(1, parents.length)];
        fk.columns.forEach((c, i) => (values[c] = parent ? parent[fk.refColumns[i]!] : null));
      }
      const names = Object.keys(values);
      try {
        await conn.query(`INSERT INTO ${q(table)} (${names.map(q).join(", ")}) VALUES (${names.map(() => "?").join(", ")})`, names.map((k) => values[k]));
      } catch (err) {
        problems.push(`${table}: ${(err as Error).message}`);
      }
    }
  }
  return { problems };
}
