/**
 * Practical sign-offs: a learner submits evidence (photos or PDFs kept in the object store) that
 * they performed a skill of a module's skills.yaml in front of an observer; a manager of their
 * organization (or an admin) approves it or returns it with a comment.
 *
 * One row per submission. A returned submission stays as history and the learner submits again.
 * `activeKey` ("<userId>|<module>|<skill>") is set while a submission is waiting or approved and
 * cleared when it is returned: its unique index allows at most one live submission per person and
 * skill, even when two uploads race.
 */
import { datetime, index, int, mysqlTable, text, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { user } from "./auth";

export const SIGN_OFF_STATUSES = ["submitted", "approved", "returned"] as const;
export type SignOffStatus = (typeof SIGN_OFF_STATUSES)[number];

export const signOff = mysqlTable(
  "sign_off",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    /** the learner's organization when they submitted: whose managers review it (null: admins only) */
    organizationId: varchar("organization_id", { length: 36 }),
    moduleSlug: varchar("module_slug", { length: 80 }).notNull(),
    skillId: varchar("skill_id", { length: 80 }).notNull(),
    status: varchar("status", { length: 10 }).$type<SignOffStatus>().notNull().default("submitted"),
    note: text("note"),
    activeKey: varchar("active_key", { length: 200 }),
    submittedAt: datetime("submitted_at", { fsp: 3 }).notNull(),
    reviewerId: varchar("reviewer_id", { length: 36 }),
    reviewComment: text("review_comment"),
    reviewedAt: datetime("reviewed_at", { fsp: 3 }),
  },
  (t) => [
    uniqueIndex("sign_off_active_uq").on(t.activeKey),
    index("sign_off_queue_idx").on(t.organizationId, t.status, t.submittedAt),
    index("sign_off_user_idx").on(t.userId, t.moduleSlug, t.skillId),
  ],
);

/** One stored file of a submission. The original file name is kept (sanitised) for display only. */
export const signOffEvidence = mysqlTable(
  "sign_off_evidence",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    signOffId: varchar("sign_off_id", { length: 36 })
      .notNull()
      .references(() => signOff.id, { onDelete: "cascade" }),
    position: int("position").notNull(),
    objectKey: varchar("object_key", { length: 300 }).notNull(),
    thumbnailKey: varchar("thumbnail_key", { length: 300 }),
    contentType: varchar("content_type", { length: 60 }).notNull(),
    size: int("size").notNull(),
    originalName: varchar("original_name", { length: 160 }).notNull(),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
  },
  (t) => [
    uniqueIndex("sign_off_ev_object_uq").on(t.objectKey),
    uniqueIndex("sign_off_ev_thumb_uq").on(t.thumbnailKey),
    index("sign_off_ev_parent_idx").on(t.signOffId, t.position),
  ],
);

export type SignOff = typeof signOff.$inferSelect;
export type SignOffEvidence = typeof signOffEvidence.$inferSelect;
