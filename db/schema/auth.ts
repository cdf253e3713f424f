/**
 * better-auth's tables (core + admin plugin fields + database rate limit), in the shape its CLI
 * generates for MySQL. Riser's own fields on `user`: organizationId, teamId (one organization each).
 */
import { bigint, boolean, datetime, index, int, mysqlTable, primaryKey, text, timestamp, varchar } from "drizzle-orm/mysql-core";

export const user = mysqlTable(
  "user",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    name: varchar("name", { length: 200 }).notNull(),
    email: varchar("email", { length: 255 }).notNull().unique(),
    emailVerified: boolean("email_verified").default(false).notNull(),
    image: text("image"),
    createdAt: timestamp("created_at", { fsp: 3 }).defaultNow().notNull(),
    updatedAt: timestamp("updated_at", { fsp: 3 }).defaultNow().$onUpdate(() => new Date()).notNull(),
    // admin plugin
    role: varchar("role", { length: 20 }).default("learner").notNull(),
    banned: boolean("banned").default(false),
    banReason: text("ban_reason"),
    banExpires: timestamp("ban_expires", { fsp: 3 }),
    // two-factor plugin
    twoFactorEnabled: boolean("two_factor_enabled").default(false),
    // Riser
    organizationId: varchar("organization_id", { length: 36 }),
    teamId: varchar("team_id", { length: 36 }),
    /** when the person joined their current organization by a move (null: from the start) */
    organizationSince: datetime("organization_since", { fsp: 3 }),
    /** the person's language for pages, e-mails and certificates (lib/i18n/config.ts LOCALES) */
    language: varchar("language", { length: 5 }).default("en").notNull(),
  },
  // user_org_name_idx: the team board pages an organization's people in name order; user_org_idx
  // ends in the name so that one team's people are in name order too (a crew's filtered page reads
  // its own people, not the organization's), and still counts people per team index-only
  // (lib/team/board.ts, lib/team/summary.ts)
  (t) => [index("user_org_idx").on(t.organizationId, t.teamId, t.name), index("user_org_name_idx").on(t.organizationId, t.name)],
);

export const session = mysqlTable(
  "session",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    expiresAt: timestamp("expires_at", { fsp: 3 }).notNull(),
    token: varchar("token", { length: 255 }).notNull().unique(),
    createdAt: timestamp("created_at", { fsp: 3 }).defaultNow().notNull(),
    updatedAt: timestamp("updated_at", { fsp: 3 }).$onUpdate(() => new Date()).notNull(),
    ipAddress: text("ip_address"),
    userAgent: text("user_agent"),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    impersonatedBy: text("impersonated_by"),
  },
  (t) => [index("session_user_idx").on(t.userId)],
);

export const account = mysqlTable(
  "account",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    accountId: text("account_id").notNull(),
    providerId: text("provider_id").notNull(),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    accessToken: text("access_token"),
    refreshToken: text("refresh_token"),
    idToken: text("id_token"),
    accessTokenExpiresAt: timestamp("access_token_expires_at", { fsp: 3 }),
    refreshTokenExpiresAt: timestamp("refresh_token_expires_at", { fsp: 3 }),
    scope: text("scope"),
    password: text("password"),
    createdAt: timestamp("created_at", { fsp: 3 }).defaultNow().notNull(),
    updatedAt: timestamp("updated_at", { fsp: 3 }).$onUpdate(() => new Date()).notNull(),
  },
  (t) => [index("account_user_idx").on(t.userId)],
);

export const verification = mysqlTable(
  "verification",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    identifier: varchar("identifier", { length: 255 }).notNull(),
    value: text("value").notNull(),
    expiresAt: timestamp("expires_at", { fsp: 3 }).notNull(),
    createdAt: timestamp("created_at", { fsp: 3 }).defaultNow().notNull(),
    updatedAt: timestamp("updated_at", { fsp: 3 }).defaultNow().$onUpdate(() => new Date()).notNull(),
  },
  (t) => [index("verification_identifier_idx").on(t.identifier)],
);

/**
 * better-auth's two-factor plugin: one row per person who started TOTP enrolment. The secret and the
 * backup codes are stored encrypted with BETTER_AUTH_SECRET; `verified` turns true when the first code
 * from the authenticator app is accepted (only then is two-step sign-in switched on).
 */
export const twoFactor = mysqlTable(
  "two_factor",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    secret: text("secret").notNull(),
    backupCodes: text("backup_codes").notNull(),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    verified: boolean("verified").default(true),
    failedVerificationCount: int("failed_verification_count").default(0),
    lockedUntil: timestamp("locked_until", { fsp: 3 }),
  },
  (t) => [index("two_factor_user_idx").on(t.userId)],
);

/**
 * Riser: TOTP codes already accepted in a sign-in's second step (lib/auth/totp-replay.ts), so a code
 * cannot be used a second time while it is still inside its acceptance window (RFC 6238 §5.2). Only
 * an HMAC of the code (keyed with BETTER_AUTH_SECRET, bound to the person) is kept, never the code;
 * the primary key makes the claim atomic: of two requests with the same code exactly one inserts.
 */
export const totpCodeUse = mysqlTable(
  "totp_code_use",
  {
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    codeHash: varchar("code_hash", { length: 64 }).notNull(),
    expiresAt: datetime("expires_at", { fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.userId, t.codeHash] })],
);

export const rateLimit = mysqlTable("rate_limit", {
  id: varchar("id", { length: 36 }).primaryKey(),
  key: varchar("key", { length: 255 }).notNull().unique(),
  count: int("count").notNull(),
  lastRequest: bigint("last_request", { mode: "number" }).notNull(),
});

/**
 * Riser: a pending sign-up's proof of which browser chose its password (lib/auth/signup-intent.ts).
 * The sign-up answer sets a random cookie; only its SHA-256 is kept here. Confirming the e-mail
 * from that browser keeps the password; from anywhere else the password is cleared and the person
 * holding the mailbox chooses one, so nobody can pre-register someone else's address.
 */
export const signupIntent = mysqlTable("signup_intent", {
  userId: varchar("user_id", { length: 36 })
    .primaryKey()
    .references(() => user.id, { onDelete: "cascade" }),
  nonceHash: varchar("nonce_hash", { length: 64 }).notNull(),
  createdAt: datetime("created_at").notNull(),
});
