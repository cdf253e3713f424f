import "server-only";
import { asc, desc, type SQL } from "drizzle-orm";
import type { AnyMySqlColumn } from "drizzle-orm/mysql-core";

/** `%text%` for LIKE with the user's own % and _ taken literally. */
export function containing(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export function ordered(column: AnyMySqlColumn | SQL, dir: "asc" | "desc"): SQL {
  return dir === "asc" ? asc(column) : desc(column);
}

export const offsetOf = (q: { page: number; pageSize: number }) => (q.page - 1) * q.pageSize;

/** Plain JSON for the browser: dates as ISO strings. */
export function iso(d: Date | string | null | undefined): string | null {
  if (!d) return null;
  return (d instanceof Date ? d : new Date(d)).toISOString();
}
