/**
 * Portable credentials (lib/credentials): each certificate's place in the public status lists, the
 * salted hash that identifies its holder inside the credential, and each organization's reporting
 * period for continuing-education hours.
 */
import { datetime, int, mysqlTable, timestamp, uniqueIndex, varchar } from "drizzle-orm/mysql-core";

/**
 * One row per certificate that has a portable credential. The auto-increment id is the position in
 * the status lists, taken atomically by the insert: list = ⌊(id − 1) / 131 072⌋ + 1, index =
 * (id − 1) mod 131 072. A gap (a rolled-back insert) is a bit that stays 0 and is never used.
 * The hash is made from the holder's e-mail at issue, so renaming or removing the account never
 * changes a credential already handed out; the plain address is never stored here.
 */
export const credentialStatusEntry = mysqlTable(
  "credential_status_entry",
  {
    id: int("id").autoincrement().primaryKey(),
    certificateId: int("certificate_id").notNull(),
    /** 16 random bytes, hex */
    salt: varchar("salt", { length: 64 }).notNull(),
    /** "sha256$" + hex SHA-256 of the e-mail followed by the salt (Open Badges 3.0 IdentityHash) */
    identityHash: varchar("identity_hash", { length: 80 }).notNull(),
    createdAt: timestamp("created_at", { fsp: 3 }).defaultNow().notNull(),
  },
  (t) => [uniqueIndex("cred_status_cert_uq").on(t.certificateId)],
);

/**
 * How an organization totals continuing-education hours: periods of `lengthMonths` months, one of
 * which starts on the first day of `startMonth` in `startYear` (UTC). No row: calendar years.
 */
export const creditReportingPeriod = mysqlTable("credit_reporting_period", {
  organizationId: varchar("organization_id", { length: 36 }).primaryKey(),
  startYear: int("start_year").notNull(),
  startMonth: int("start_month").notNull(),
  lengthMonths: int("length_months").notNull(),
  updatedAt: datetime("updated_at", { fsp: 3 }).notNull(),
  updatedBy: varchar("updated_by", { length: 36 }),
});
