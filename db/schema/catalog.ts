/**
 * Catalog rows synced from content/ (upsert by slug; never deleted — a removed item is marked
 * retired so that nobody's history loses its reference), and per-person lesson progress.
 */
import {
  boolean,
  datetime,
  decimal,
  index,
  int,
  json,
  mysqlTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { user } from "./auth";

export const catalogModule = mysqlTable("catalog_module", {
  id: int("id").autoincrement().primaryKey(),
  slug: varchar("slug", { length: 80 }).notNull().unique(),
  title: varchar("title", { length: 200 }).notNull(),
  position: int("position").notNull(),
  ceHours: decimal("ce_hours", { precision: 4, scale: 2 }).notNull(),
  passMark: int("pass_mark").notNull(),
  validityMonths: int("validity_months").notNull(),
  quizRules: json("quiz_rules").notNull(),
  requiredSkills: json("required_skills").$type<string[]>().notNull(),
  retiredAt: timestamp("retired_at", { fsp: 3 }),
  syncedAt: timestamp("synced_at", { fsp: 3 }).notNull(),
});

export const catalogLesson = mysqlTable(
  "catalog_lesson",
  {
    id: int("id").autoincrement().primaryKey(),
    moduleId: int("module_id")
      .notNull()
      .references(() => catalogModule.id),
    slug: varchar("slug", { length: 80 }).notNull(),
    title: varchar("title", { length: 200 }).notNull(),
    minutes: int("minutes").notNull(),
    position: int("position").notNull(),
    /** the lesson's content revision (frontmatter `revision`) */
    revision: int("revision").notNull().default(1),
    retiredAt: timestamp("retired_at", { fsp: 3 }),
    syncedAt: timestamp("synced_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("lesson_module_slug_uq").on(t.moduleId, t.slug)],
);

export const catalogPath = mysqlTable("catalog_path", {
  id: int("id").autoincrement().primaryKey(),
  slug: varchar("slug", { length: 80 }).notNull().unique(),
  title: varchar("title", { length: 200 }).notNull(),
  moduleSlugs: json("module_slugs").$type<string[]>().notNull(),
  validityMonths: int("validity_months").notNull(),
  retiredAt: timestamp("retired_at", { fsp: 3 }),
  syncedAt: timestamp("synced_at", { fsp: 3 }).notNull(),
});

export const catalogCard = mysqlTable("catalog_card", {
  id: int("id").autoincrement().primaryKey(),
  slug: varchar("slug", { length: 80 }).notNull().unique(),
  title: varchar("title", { length: 200 }).notNull(),
  retiredAt: timestamp("retired_at", { fsp: 3 }),
  syncedAt: timestamp("synced_at", { fsp: 3 }).notNull(),
});

export const contentSync = mysqlTable("content_sync", {
  id: int("id").autoincrement().primaryKey(),
  at: timestamp("at", { fsp: 3 }).defaultNow().notNull(),
  ok: boolean("ok").notNull(),
  counts: json("counts").notNull(),
  problems: text("problems"),
});

export const lessonProgress = mysqlTable(
  "lesson_progress",
  {
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    lessonId: int("lesson_id")
      .notNull()
      .references(() => catalogLesson.id),
    completedAt: timestamp("completed_at", { fsp: 3 }).defaultNow().notNull(),
    // A mark made with no connection and sent later: the reading time and the moment of marking
    // as the phone reported them (never trusted for the seat-time rule; shown as the phone's).
    deviceReadingSeconds: int("device_reading_seconds"),
    deviceMarkedAt: datetime("device_marked_at", { fsp: 3 }),
  },
  (t) => [primaryKey({ columns: [t.userId, t.lessonId] }), index("progress_lesson_idx").on(t.lessonId)],
);
