/**
 * The code an organization works under: the jurisdictions it works in with the NFPA 13D edition each
 * adopted and whether the residential code's combined-system path (IRC P2904) is in force there (one
 * is the default, the edition its people are taught to); its local amendments (a short note per
 * card topic); and the material content changes that make a refresher due for people who completed
 * a module before them.
 */
import { boolean, datetime, index, int, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { user } from "./auth";
import { organization } from "./org";

export const jurisdiction = mysqlTable(
  "org_jurisdiction",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    organizationId: varchar("organization_id", { length: 36 })
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    name: varchar("name", { length: 120 }).notNull(),
    state: varchar("state", { length: 60 }).notNull(),
    /** NFPA 13D edition year: 2013 | 2016 | 2019 | 2022 | 2025 */
    edition: int("edition").notNull(),
    /** IRC Section P2904 (combined multipurpose path) in force there */
    ircP2904: boolean("irc_p2904").notNull().default(false),
    isDefault: boolean("is_default").notNull().default(false),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
    updatedAt: datetime("updated_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("jurisdiction_org_name_uq").on(t.organizationId, t.name, t.state)],
);

/** One local note per organization and card topic; plain text, shown escaped. */
export const localAmendment = mysqlTable(
  "local_amendment",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    organizationId: varchar("organization_id", { length: 36 })
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    topic: varchar("topic", { length: 20 }).notNull(),
    body: varchar("body", { length: 600 }).notNull(),
    authorId: varchar("author_id", { length: 36 }),
    authorName: varchar("author_name", { length: 200 }).notNull(),
    updatedAt: datetime("updated_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("amendment_org_topic_uq").on(t.organizationId, t.topic)],
);

/**
 * A material change found by the catalog sync: a lesson or question whose `revision` rose with a
 * "what changed" line. Recorded once per item and revision.
 */
export const materialChange = mysqlTable(
  "material_change",
  {
    id: int("id").autoincrement().primaryKey(),
    moduleSlug: varchar("module_slug", { length: 80 }).notNull(),
    kind: varchar("kind", { length: 10 }).$type<"lesson" | "question">().notNull(),
    /** lesson slug or question id */
    itemSlug: varchar("item_slug", { length: 80 }).notNull(),
    revision: int("revision").notNull(),
    whatChanged: varchar("what_changed", { length: 200 }).notNull(),
    recordedAt: datetime("recorded_at", { fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("material_change_item_uq").on(t.moduleSlug, t.kind, t.itemSlug, t.revision), index("material_change_module_idx").on(t.moduleSlug, t.recordedAt)],
);

/** A passed refresher: clears every material change of the module recorded before `completedAt`. */
export const refresherCompletion = mysqlTable(
  "refresher_completion",
  {
    id: int("id").autoincrement().primaryKey(),
    userId: varchar("user_id", { length: 36 })
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    moduleSlug: varchar("module_slug", { length: 80 }).notNull(),
    /** percent on the changed questions; null when only lessons changed (re-read, no quiz) */
    score: int("score"),
    completedAt: datetime("completed_at", { fsp: 3 }).notNull(),
  },
  (t) => [index("refresher_user_module_idx").on(t.userId, t.moduleSlug, t.completedAt)],
);
