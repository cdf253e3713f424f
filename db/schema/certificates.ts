/**
 * Certificates earned by completing a module or a whole learning path, the per-year serial counter
 * that numbers them without gaps, and the fixed-window counters behind the public verification
 * rate limit (kept in MariaDB because app servers hold no state).
 *
 * Status (valid / expired / revoked) is never stored: it is computed from `expiresAt` and
 * `revokedAt` at the moment someone looks (lib/certificates/status.ts), so no job can forget it.
 * No foreign keys to user or completion rows: a certificate is a record that must stay verifiable
 * after an account is removed, so it copies the holder's and organization's names at issue.
 */
import { bigint, datetime, decimal, foreignKey, index, int, mysqlTable, primaryKey, text, timestamp, uniqueIndex, varbinary, varchar } from "drizzle-orm/mysql-core";

export const certificate = mysqlTable(
  "certificate",
  {
    id: int("id").autoincrement().primaryKey(),
    /** "RSR-2026-000123": year of issue and a number that runs 1, 2, 3 … within that year */
    serial: varchar("serial", { length: 20 }).notNull(),
    serialYear: int("serial_year").notNull(),
    serialNumber: int("serial_number").notNull(),
    /** 18 random bytes (144 bits), base64url: the only key the public verification accepts.
     * varbinary so that comparison and uniqueness are case-sensitive, as base64url is. */
    verificationCode: varbinary("verification_code", { length: 32 }).notNull(),
    userId: varchar("user_id", { length: 36 }).notNull(),
    holderName: varchar("holder_name", { length: 200 }).notNull(),
    organizationId: varchar("organization_id", { length: 36 }),
    organizationName: varchar("organization_name", { length: 200 }),
    kind: varchar("kind", { length: 10 }).$type<"module" | "path">().notNull(),
    /** module slug (kind module) or learning-path slug (kind path) */
    subjectSlug: varchar("subject_slug", { length: 80 }).notNull(),
    subjectTitle: varchar("subject_title", { length: 200 }).notNull(),
    ceHours: decimal("ce_hours", { precision: 5, scale: 2 }).notNull(),
    /** the NFPA 13D edition the material was taught to (the passing attempt's); null: none set */
    edition: int("edition"),
    /** the module completion that earned it (for a path: the completion that finished the path) */
    completionId: int("completion_id").notNull(),
    issuedAt: datetime("issued_at", { fsp: 3 }).notNull(),
    expiresAt: datetime("expires_at", { fsp: 3 }).notNull(),
    /** the earlier certificate for the same module or path that this one renews */
    renewsCertificateId: int("renews_certificate_id"),
    /** set when the 30-day expiry reminder was claimed for sending (once per certificate) */
    reminderSentAt: datetime("reminder_sent_at", { fsp: 3 }),
    revokedAt: datetime("revoked_at", { fsp: 3 }),
    revokedBy: varchar("revoked_by", { length: 36 }),
    revokeReason: text("revoke_reason"),
    createdAt: timestamp("created_at", { fsp: 3 }).defaultNow().notNull(),
  },
  (t) => [
    uniqueIndex("cert_serial_uq").on(t.serial),
    uniqueIndex("cert_year_number_uq").on(t.serialYear, t.serialNumber),
    uniqueIndex("cert_code_uq").on(t.verificationCode),
    // one module certificate per completion, one certificate per path per finishing completion
    uniqueIndex("cert_completion_uq").on(t.completionId, t.kind, t.subjectSlug),
    index("cert_holder_idx").on(t.userId, t.kind, t.subjectSlug, t.issuedAt),
    index("cert_org_expiry_idx").on(t.organizationId, t.expiresAt),
    index("cert_expiry_idx").on(t.expiresAt),
    index("cert_renews_idx").on(t.renewsCertificateId),
    foreignKey({ name: "cert_renews_fk", columns: [t.renewsCertificateId], foreignColumns: [t.id] }).onDelete("set null"),
  ],
);

export type Certificate = typeof certificate.$inferSelect;
export type NewCertificate = typeof certificate.$inferInsert;

/** One row per year; its `lastNumber` is locked (SELECT … FOR UPDATE) by the issuing transaction. */
export const certificateSerialCounter = mysqlTable("certificate_serial_counter", {
  year: int("year").primaryKey(),
  lastNumber: int("last_number").notNull().default(0),
});

/** Hits per key per fixed window (window start in epoch seconds). Old windows are pruned by a job. */
export const rateLimitBucket = mysqlTable(
  "rate_limit_bucket",
  {
    bucketKey: varchar("bucket_key", { length: 120 }).notNull(),
    windowStart: bigint("window_start", { mode: "number" }).notNull(),
    hits: int("hits").notNull().default(0),
  },
  (t) => [primaryKey({ name: "rate_bucket_pk", columns: [t.bucketKey, t.windowStart] }), index("rate_bucket_window_idx").on(t.windowStart)],
);
