/**
 * Quiz question versions (synced from content: a changed question gets a new version; attempts keep
 * theirs), attempts with their drawn items, and module completions.
 */
import { boolean, datetime, foreignKey, index, int, json, mysqlTable, primaryKey, text, timestamp, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { user } from "./auth";

export const questionVersion = mysqlTable(
  "quiz_question_version",
  {
    id: int("id").autoincrement().primaryKey(),
    moduleSlug: varchar("module_slug", { length: 80 }).notNull(),
    questionId: varchar("question_id", { length: 80 }).notNull(),
    version: int("version").notNull(),
    hash: varchar("hash", { length: 64 }).notNull(),
    body: json("body").notNull(),
    createdAt: timestamp("created_at", { fsp: 3 }).defaultNow().notNull(),
    retiredAt: timestamp("retired_at", { fsp: 3 }),
  },
  (t) => [uniqueIndex("qv_question_version_uq").on(t.questionId, t.version), index("qv_module_idx").on(t.moduleSlug)],
);

export const quizAttempt = mysqlTable(
  "quiz_attempt",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    organizationId: varchar("organization_id", { length: 36 }),
    moduleSlug: varchar("module_slug", { length: 80 }).notNull(),
    seed: int("seed", { unsigned: true }).notNull(),
    status: varchar("status", { length: 10 }).notNull().default("open"), // open | graded
    startedAt: datetime("started_at", { fsp: 3 }).notNull(),
    deadlineAt: datetime("deadline_at", { fsp: 3 }),
    submittedAt: datetime("submitted_at", { fsp: 3 }),
    score: int("score"),
    passed: boolean("passed"),
    passMark: int("pass_mark").notNull(),
    lateGraded: boolean("late_graded").notNull().default(false),
    /** the NFPA 13D edition the questions were drawn for (the organization's default); null: none set */
    edition: int("edition"),
  },
  (t) => [index("attempt_user_module_idx").on(t.userId, t.moduleSlug, t.startedAt), index("attempt_org_idx").on(t.organizationId, t.moduleSlug)],
);

export const quizAttemptItem = mysqlTable(
  "quiz_attempt_item",
  {
    attemptId: varchar("attempt_id", { length: 36 })
      .notNull()
      .references(() => quizAttempt.id, { onDelete: "cascade" }),
    position: int("position").notNull(),
    questionVersionId: int("question_version_id").notNull(),
    optionOrder: json("option_order").$type<string[] | null>(),
    params: json("params").$type<Record<string, number> | null>(),
    answer: json("answer"),
    correct: boolean("correct"),
  },
  (t) => [
    primaryKey({ columns: [t.attemptId, t.position] }),
    foreignKey({ name: "attempt_item_version_fk", columns: [t.questionVersionId], foreignColumns: [questionVersion.id] }),
  ],
);

/** One row each time a person completes a module (renewal = a later row). */
export const moduleCompletion = mysqlTable(
  "module_completion",
  {
    id: int("id").autoincrement().primaryKey(),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    moduleSlug: varchar("module_slug", { length: 80 }).notNull(),
    attemptId: varchar("attempt_id", { length: 36 }).notNull(),
    completedAt: datetime("completed_at", { fsp: 3 }).notNull(),
    note: text("note"),
  },
  (t) => [
    uniqueIndex("completion_attempt_uq").on(t.attemptId),
    // one person's completions of a module; with completed_at: completions per week, index-only per person
    index("completion_user_idx").on(t.userId, t.moduleSlug, t.completedAt),
  ],
);
