/**
 * The team board's facts per person × module, kept by database triggers in the same transaction as
 * every write to their sources (lesson progress, attempts, completions, certificates, assignments,
 * a person's team or organization): db/migrations/0011_board_cell.sql. Only time-free facts are
 * stored; the status (which depends on "now") is computed when the board is read
 * (lib/team/board-cells.ts), with the rule of lib/team/status.ts.
 */
import { sql } from "drizzle-orm";
import { datetime, foreignKey, index, int, mysqlTable, primaryKey, varchar } from "drizzle-orm/mysql-core";
import { user } from "./auth";

export const boardCell = mysqlTable(
  "board_cell",
  {
    userId: varchar("user_id", { length: 36 }).notNull(),
    moduleSlug: varchar("module_slug", { length: 80 }).notNull(),
    /** the person's current organization and team (copied; the user trigger keeps them) */
    organizationId: varchar("organization_id", { length: 36 }),
    teamId: varchar("team_id", { length: 36 }),
    /** lessons done (retired lessons not counted), attempts in the current organization */
    lessonsDone: int("lessons_done").notNull().default(0),
    attempts: int("attempts").notNull().default(0),
    bestScore: int("best_score"),
    lastGradedAt: datetime("last_graded_at", { fsp: 3 }),
    lastPassAt: datetime("last_pass_at", { fsp: 3 }),
    completedAt: datetime("completed_at", { fsp: 3 }),
    /** module certificates earned in the current organization (any state), latest unrevoked expiry */
    certificates: int("certificates").notNull().default(0),
    validUntil: datetime("valid_until", { fsp: 3 }),
    /** the earliest due date among the person's direct and current-team assignments */
    dueAt: datetime("due_at", { fsp: 3 }),
    /** the module's validity (catalog_module, set by a trigger on insert, by the catalog sync on change) */
    validityMonths: int("validity_months").notNull().default(0),
    /** lib/team/status.ts expiryOf: the latest unrevoked certificate's end, else completion + validity */
    expiresAt: datetime("expires_at", { fsp: 3 }).generatedAlwaysAs(sql`IF(certificates > 0, valid_until, completed_at + INTERVAL validity_months MONTH)`, { mode: "stored" }),
  },
  (t) => [
    primaryKey({ name: "board_cell_pk", columns: [t.userId, t.moduleSlug] }),
    foreignKey({ name: "board_cell_user_fk", columns: [t.userId], foreignColumns: [user.id] }).onDelete("cascade"),
    // totals per team and module (covering, read in index order: no per-row module filter, no
    // temporary table) and team-scoped filters; org-wide filters by expiry and by due date
    index("board_cell_org_idx").on(t.organizationId, t.teamId, t.moduleSlug, t.expiresAt, t.dueAt, t.lastGradedAt, t.lastPassAt, t.lessonsDone, t.attempts),
    index("board_cell_org_expiry_idx").on(t.organizationId, t.expiresAt, t.dueAt),
    index("board_cell_org_due_idx").on(t.organizationId, t.dueAt, t.expiresAt),
  ],
);
