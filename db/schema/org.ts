/** Organizations (a sprinkler contractor or a home builder), their teams, and the audit and mail logs. */
import { boolean, datetime, index, int, json, mysqlTable, text, timestamp, uniqueIndex, varchar } from "drizzle-orm/mysql-core";

export const organization = mysqlTable("organization", {
  id: varchar("id", { length: 36 }).primaryKey(),
  name: varchar("name", { length: 200 }).notNull(),
  kind: varchar("kind", { length: 20 }).notNull().default("contractor"), // contractor | builder
  seats: int("seats").notNull().default(3),
  trialEndsAt: datetime("trial_ends_at"),
  /** the organization's managers must use two-step sign-in (TOTP) before team pages and APIs work */
  requireManagerTwoFactor: boolean("require_manager_two_factor").default(false).notNull(),
  /** the language new invitations start with (a manager may change it per invitation) */
  defaultLanguage: varchar("default_language", { length: 5 }).default("en").notNull(),
  createdAt: timestamp("created_at", { fsp: 3 }).defaultNow().notNull(),
});

export const team = mysqlTable(
  "team",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    organizationId: varchar("organization_id", { length: 36 })
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    name: varchar("name", { length: 120 }).notNull(),
    createdAt: timestamp("created_at", { fsp: 3 }).defaultNow().notNull(),
    /** archived teams keep their people's history but leave pickers, filters and new invitations */
    archivedAt: datetime("archived_at", { fsp: 3 }),
  },
  (t) => [uniqueIndex("team_org_name_uq").on(t.organizationId, t.name)],
);

/**
 * A membership that ended when an admin moved the person to another organization: the organization
 * left keeps read-only sight of the person's records dated between joinedAt (null: from the start)
 * and leftAt (lib/access/records.ts). Written in the move's transaction.
 */
export const formerMembership = mysqlTable(
  "former_membership",
  {
    id: int("id").autoincrement().primaryKey(),
    userId: varchar("user_id", { length: 36 }).notNull(),
    organizationId: varchar("organization_id", { length: 36 })
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    joinedAt: datetime("joined_at", { fsp: 3 }),
    leftAt: datetime("left_at", { fsp: 3 }).notNull(),
  },
  (t) => [index("former_membership_org_user_idx").on(t.organizationId, t.userId, t.leftAt)],
);

/** Append-only in the app's code paths: written only through lib/audit. */
export const auditLog = mysqlTable(
  "audit_log",
  {
    id: int("id").autoincrement().primaryKey(),
    at: timestamp("at", { fsp: 3 }).defaultNow().notNull(),
    actorId: varchar("actor_id", { length: 36 }),
    actorEmail: varchar("actor_email", { length: 255 }),
    organizationId: varchar("organization_id", { length: 36 }),
    action: varchar("action", { length: 64 }).notNull(),
    targetType: varchar("target_type", { length: 40 }).notNull(),
    targetId: varchar("target_id", { length: 64 }).notNull(),
    reason: text("reason"),
    ip: varchar("ip", { length: 64 }),
    details: json("details"),
  },
  (t) => [index("audit_at_idx").on(t.at), index("audit_org_idx").on(t.organizationId, t.at)],
);

export const mailLog = mysqlTable(
  "mail_log",
  {
    id: int("id").autoincrement().primaryKey(),
    at: timestamp("at", { fsp: 3 }).defaultNow().notNull(),
    to: varchar("to", { length: 255 }).notNull(),
    subject: varchar("subject", { length: 255 }).notNull(),
    kind: varchar("kind", { length: 40 }).notNull(),
    status: varchar("status", { length: 12 }).notNull(), // sent | failed
    error: text("error"),
    body: text("body"), // kept only outside production
  },
  (t) => [index("mail_at_idx").on(t.at)],
);
