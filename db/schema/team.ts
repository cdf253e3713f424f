/**
 * Team training management: invitations (single-use, expiring; only the token's SHA-256 is kept),
 * assignments of a module or a learning path to one person or a whole team, and the reminder log
 * that makes reminder mail idempotent per period.
 */
import { datetime, index, int, json, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { user } from "./auth";
import { organization, team } from "./org";

export const invitation = mysqlTable(
  "invitation",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    organizationId: varchar("organization_id", { length: 36 })
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    teamId: varchar("team_id", { length: 36 }),
    email: varchar("email", { length: 255 }).notNull(),
    name: varchar("name", { length: 200 }),
    role: varchar("role", { length: 20 }).notNull(), // learner | sales | manager
    /** hex SHA-256 of the 256-bit random token in the mailed link; the token itself is never stored */
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    invitedBy: varchar("invited_by", { length: 36 }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
    expiresAt: datetime("expires_at", { fsp: 3 }).notNull(),
    acceptedAt: datetime("accepted_at", { fsp: 3 }),
    acceptedUserId: varchar("accepted_user_id", { length: 36 }),
    revokedAt: datetime("revoked_at", { fsp: 3 }),
    /** who withdrew it (null when a newer invitation replaced it) */
    revokedBy: varchar("revoked_by", { length: 36 }),
    /** when the mail last went out (a resend keeps the row and issues a new token) */
    lastSentAt: datetime("last_sent_at", { fsp: 3 }),
    sendCount: int("send_count").notNull().default(1),
    /** the invitation's language (mail and the new account's starting language) */
    language: varchar("language", { length: 5 }).default("en").notNull(),
    /** work to assign on acceptance: [{ kind: "module" | "path", slug, dueAt: "YYYY-MM-DD" }] */
    assignOnAccept: json("assign_on_accept").$type<{ kind: "module" | "path"; slug: string; dueAt: string }[]>(),
  },
  (t) => [
    uniqueIndex("invitation_token_uq").on(t.tokenHash),
    index("invitation_org_email_idx").on(t.organizationId, t.email),
    index("invitation_org_open_idx").on(t.organizationId, t.acceptedAt, t.revokedAt, t.expiresAt),
  ],
);

/**
 * One module or learning path assigned to one person (`userId`) or to a whole team (`teamId`).
 * Team assignments are never copied to people: the board and /learn join on the person's current
 * team at read time, so someone who joins a team later inherits its assignments.
 * `targetKey` is "u:<userId>" or "t:<teamId>"; assigning the same item to the same target again
 * updates the due date instead of adding a row.
 */
export const assignment = mysqlTable(
  "assignment",
  {
    id: int("id").autoincrement().primaryKey(),
    organizationId: varchar("organization_id", { length: 36 })
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    kind: varchar("kind", { length: 10 }).notNull(), // module | path
    targetSlug: varchar("target_slug", { length: 80 }).notNull(),
    userId: varchar("user_id", { length: 36 }).references(() => user.id, { onDelete: "cascade" }),
    teamId: varchar("team_id", { length: 36 }).references(() => team.id, { onDelete: "cascade" }),
    targetKey: varchar("target_key", { length: 40 }).notNull(),
    dueAt: datetime("due_at").notNull(),
    createdBy: varchar("created_by", { length: 36 }),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [
    uniqueIndex("assignment_item_target_uq").on(t.organizationId, t.kind, t.targetSlug, t.targetKey),
    index("assignment_user_idx").on(t.userId, t.dueAt),
    index("assignment_team_idx").on(t.teamId, t.dueAt),
    index("assignment_org_due_idx").on(t.organizationId, t.dueAt),
  ],
);

/**
 * A reminder is claimed here (INSERT IGNORE on the unique key) before its mail is sent, so two
 * runs in the same period never mail twice. `periodKey` names the item and the period, e.g.
 * "a17:2027-W03" (an overdue assignment, once a week) or "digest:2027-W03".
 */
export const reminderLog = mysqlTable(
  "reminder_log",
  {
    id: int("id").autoincrement().primaryKey(),
    kind: varchar("kind", { length: 20 }).notNull(), // overdue | due-soon | digest
    userId: varchar("user_id", { length: 36 }).notNull(),
    periodKey: varchar("period_key", { length: 80 }).notNull(),
    sentAt: datetime("sent_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("reminder_once_uq").on(t.kind, t.userId, t.periodKey)],
);
