/**
 * The mail outbox (every message is written here, in the same transaction as the change that causes
 * it, and delivered by a worker with retries) and the server's own stamp of when a person first
 * opened a lesson (the seat-time rule in lib/progress counts from it; the client never sends times).
 */
import { datetime, index, int, mysqlTable, primaryKey, text, timestamp, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { user } from "./auth";
import { catalogLesson } from "./catalog";

export const mailOutbox = mysqlTable(
  "mail_outbox",
  {
    id: int("id").autoincrement().primaryKey(),
    createdAt: timestamp("created_at", { fsp: 3 }).defaultNow().notNull(),
    /** optional caller key (e.g. "certificate.issued:123"): the same message is queued once */
    dedupeKey: varchar("dedupe_key", { length: 191 }),
    to: varchar("to", { length: 255 }).notNull(),
    subject: varchar("subject", { length: 255 }).notNull(),
    kind: varchar("kind", { length: 40 }).notNull(),
    body: text("body").notNull(),
    /** pending → sent, or failed after the last retry */
    status: varchar("status", { length: 12 }).$type<"pending" | "sent" | "failed">().notNull().default("pending"),
    tries: int("tries").notNull().default(0),
    nextAttemptAt: datetime("next_attempt_at", { fsp: 3 }).notNull(),
    /** a worker's claim on the row; another worker takes it only after this passes */
    claimedUntil: datetime("claimed_until", { fsp: 3 }),
    lastError: text("last_error"),
    sentAt: datetime("sent_at", { fsp: 3 }),
  },
  (t) => [uniqueIndex("outbox_dedupe_uq").on(t.dedupeKey), index("outbox_due_idx").on(t.status, t.nextAttemptAt)],
);

export const lessonOpen = mysqlTable(
  "lesson_open",
  {
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    lessonId: int("lesson_id")
      .notNull()
      .references(() => catalogLesson.id),
    /** server clock at the first open; never taken from the client */
    firstOpenedAt: datetime("first_opened_at", { fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ name: "lesson_open_pk", columns: [t.userId, t.lessonId] }), index("lesson_open_lesson_idx").on(t.lessonId)],
);
