/**
 * The team board's facts per person × module, kept by database triggers in the same transaction as
 * every write to their sources (lesson progress, attempts, completions, certificates, assignments,
 * a person's team or organization): db/migrations/0011_board_cell.sql. Only time-free facts are
 * stored; the status (which depends on "now") is computed when the board is read
 * (lib/team/board-cells.ts), with the rule of lib/team/status.ts.
 */
import { sql } from "drizzle-orm";
import { bigint, boolean, datetime, foreignKey, index, int, mysqlTable, primaryKey, tinyint, varchar } from "drizzle-orm/mysql-core";
import { user } from "./auth";
import { organization } from "./org";

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

/**
 * Stored totals per organization, team and module (DEVELOPERS.md "Team board: stored cells"): the
 * statuses of the organization's cells as they stood at `counted_at`. The time a total was taken
 * at is fixed, so a cell's status at it is a function of the cell alone: every change of a cell
 * adds one insert-only row to board_count_delta (a trigger on board_cell, in the writer's
 * transaction, no shared row locked), and the fold (lib/team/board-counts.ts: the job
 * "board-counts-fold", or a reader finding the totals stale) moves those rows into the totals and
 * moves `counted_at` to "now" by recounting the few cells whose due date or expiry lies between
 * the two times. A reader adds the same two corrections to the stored totals in one snapshot.
 */
export const boardCountState = mysqlTable(
  "board_count_state",
  {
    organizationId: varchar("organization_id", { length: 36 }).notNull().primaryKey(),
    /** the time every total of the organization in board_team_count is evaluated at */
    countedAt: datetime("counted_at", { fsp: 3 }).notNull(),
  },
  (t) => [foreignKey({ name: "board_count_state_org_fk", columns: [t.organizationId], foreignColumns: [organization.id] }).onDelete("cascade")],
);

export const boardTeamCount = mysqlTable(
  "board_team_count",
  {
    organizationId: varchar("organization_id", { length: 36 }).notNull(),
    /** the team's id, "" for people without a team */
    teamKey: varchar("team_key", { length: 36 }).notNull(),
    moduleSlug: varchar("module_slug", { length: 80 }).notNull(),
    /** cells per status at board_count_state.counted_at (passed: valid beyond the expiring window) */
    passed: int("passed").notNull().default(0),
    expiring: int("expiring").notNull().default(0),
    overdue: int("overdue").notNull().default(0),
    expired: int("expired").notNull().default(0),
    failed: int("failed").notNull().default(0),
  },
  (t) => [
    primaryKey({ name: "board_team_count_pk", columns: [t.organizationId, t.teamKey, t.moduleSlug] }),
    foreignKey({ name: "board_team_count_org_fk", columns: [t.organizationId], foreignColumns: [organization.id] }).onDelete("cascade"),
  ],
);

/**
 * One row per change of a counted cell since the last fold: the cell's status-deciding facts
 * before (n = -1) and after (n = +1). Insert-only for writers; the fold deletes what it folded.
 */
export const boardCountDelta = mysqlTable(
  "board_count_delta",
  {
    id: bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey(),
    organizationId: varchar("organization_id", { length: 36 }).notNull(),
    teamId: varchar("team_id", { length: 36 }),
    moduleSlug: varchar("module_slug", { length: 80 }).notNull(),
    expiresAt: datetime("expires_at", { fsp: 3 }),
    dueAt: datetime("due_at", { fsp: 3 }),
    /** the last graded attempt failed (lib/team/status.ts rule 5) */
    failed: boolean("failed").notNull(),
    n: tinyint("n").notNull(),
  },
  (t) => [index("board_count_delta_org_idx").on(t.organizationId, t.id)],
);
