import "server-only";
import { and, asc, eq, getTableColumns, is } from "drizzle-orm";
import { MySqlTable, type AnyMySqlColumn } from "drizzle-orm/mysql-core";
import { db } from "@/db/client";
import * as schema from "@/db/schema";
import { catalogLesson, catalogModule, lessonOpen, lessonProgress, moduleCompletion, organization, quizAttempt, team, user } from "@/db/schema";
import { toSafeCsv, type CsvValue } from "@/lib/csv";

export type RecordRow = Record<string, string | number | boolean | null>;

/** "Download my records": one person's own rows, nobody else's. */
export type MyRecords = {
  generatedAt: string;
  person: { id: string; name: string; email: string; role: string; organization: string | null; team: string | null };
  lessons: RecordRow[];
  attempts: RecordRow[];
  completions: RecordRow[];
  certificates: RecordRow[];
  signOffs: RecordRow[];
  /** Areas whose tables this instance does not have yet (so an empty list is not mistaken for "none"). */
  notAvailable: string[];
};

const plain = (v: unknown): string | number | boolean | null => {
  if (v === null || v === undefined) return null;
  if (v instanceof Date) return v.toISOString();
  if (Buffer.isBuffer(v)) return v.toString("utf8"); // varbinary text, e.g. a certificate's verification code
  if (typeof v === "string" || typeof v === "number" || typeof v === "boolean") return v;
  return JSON.stringify(v);
};

// Columns never exported, whatever table they are in.
const SECRET_COLUMN = /token|secret|hash|password/i;

/**
 * Rows of a table that another area owns, read without a compile-time dependency on it: the first
 * exported table of `names` that exists, filtered on the first owner column it has. Returns null
 * when no such table exists yet.
 */
async function ownRowsOf(names: string[], ownerColumns: string[], userId: string): Promise<RecordRow[] | null> {
  const tables = schema as unknown as Record<string, unknown>;
  for (const name of names) {
    const table = tables[name];
    if (!is(table, MySqlTable)) continue;
    const columns = getTableColumns(table) as Record<string, AnyMySqlColumn>;
    const owner = ownerColumns.map((c) => columns[c]).find(Boolean);
    if (!owner) continue;
    const rows = (await db.select().from(table).where(eq(owner, userId))) as Record<string, unknown>[];
    return rows.map((r) => {
      const out: RecordRow = Object.fromEntries(Object.entries(r).filter(([k]) => !SECRET_COLUMN.test(k)).map(([k, v]) => [k, plain(v)]));
      // Certificates store no status: it follows from expiry and revocation at the moment of reading.
      if ("expiresAt" in r && "revokedAt" in r && !("status" in r)) {
        out.status = r.revokedAt ? "revoked" : r.expiresAt instanceof Date && r.expiresAt.getTime() < Date.now() ? "expired" : "valid";
      }
      return out;
    });
  }
  return null;
}

/**
 * Everything Riser holds about one person's training, for "download my records". Every query is
 * filtered on this person's id.
 *
 * EXTENSION POINT for the lead: certificates and sign-offs are read defensively below (their tables
 * may not exist yet when this was written). Once db/schema/certificates.ts and the sign-off schema
 * land, replace the two `ownRowsOf` calls with typed queries if a friendlier shape is wanted.
 */
export async function collectMyRecords(userId: string): Promise<MyRecords> {
  const [person] = await db
    .select({ id: user.id, name: user.name, email: user.email, role: user.role, organization: organization.name, team: team.name })
    .from(user)
    .leftJoin(organization, eq(organization.id, user.organizationId))
    .leftJoin(team, eq(team.id, user.teamId))
    .where(eq(user.id, userId));
  if (!person) throw new Error(`no person ${userId}`);

  const lessons = await db
    .select({
      module: catalogModule.slug,
      moduleTitle: catalogModule.title,
      lesson: catalogLesson.slug,
      lessonTitle: catalogLesson.title,
      // the server's own first-open stamp: reading time = completedAt − firstOpenedAt
      firstOpenedAt: lessonOpen.firstOpenedAt,
      completedAt: lessonProgress.completedAt,
      // a mark made offline: the reading time and moment of marking as the phone reported them
      deviceReadingSeconds: lessonProgress.deviceReadingSeconds,
      deviceMarkedAt: lessonProgress.deviceMarkedAt,
    })
    .from(lessonProgress)
    .innerJoin(catalogLesson, eq(catalogLesson.id, lessonProgress.lessonId))
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .leftJoin(lessonOpen, and(eq(lessonOpen.userId, lessonProgress.userId), eq(lessonOpen.lessonId, lessonProgress.lessonId)))
    .where(eq(lessonProgress.userId, userId))
    .orderBy(asc(lessonProgress.completedAt));

  const attempts = await db
    .select({
      id: quizAttempt.id,
      module: quizAttempt.moduleSlug,
      status: quizAttempt.status,
      startedAt: quizAttempt.startedAt,
      submittedAt: quizAttempt.submittedAt,
      score: quizAttempt.score,
      passMark: quizAttempt.passMark,
      passed: quizAttempt.passed,
    })
    .from(quizAttempt)
    .where(eq(quizAttempt.userId, userId))
    .orderBy(asc(quizAttempt.startedAt));

  const completions = await db
    .select({ id: moduleCompletion.id, module: moduleCompletion.moduleSlug, attemptId: moduleCompletion.attemptId, completedAt: moduleCompletion.completedAt })
    .from(moduleCompletion)
    .where(eq(moduleCompletion.userId, userId))
    .orderBy(asc(moduleCompletion.completedAt));

  const certificates = await ownRowsOf(["certificate", "certificates"], ["userId", "personId", "learnerId"], userId);
  const signOffs = await ownRowsOf(["signOff", "signoff", "skillSignOff", "signOffs"], ["userId", "learnerId", "personId"], userId);

  const rows = <T extends Record<string, unknown>>(list: T[]) => list.map((r) => Object.fromEntries(Object.entries(r).map(([k, v]) => [k, plain(v)])));
  return {
    generatedAt: new Date().toISOString(),
    person,
    lessons: rows(lessons),
    attempts: rows(attempts),
    completions: rows(completions),
    certificates: certificates ?? [],
    signOffs: signOffs ?? [],
    notAvailable: [...(certificates ? [] : ["certificates"]), ...(signOffs ? [] : ["signOffs"])],
  };
}

const CSV_COLUMNS = ["record", "module", "item", "status", "score", "date_utc", "reference", "details"];

function pick(r: RecordRow, keys: string[]): CsvValue {
  for (const k of keys) if (r[k] !== undefined && r[k] !== null) return r[k];
  return null;
}

/** One CSV with a `record` column (lesson, attempt, completion, certificate, sign-off). */
export function recordsCsv(r: MyRecords): string {
  const out: Record<string, CsvValue>[] = [];
  for (const l of r.lessons) {
    const phone = l.deviceReadingSeconds === null || l.deviceReadingSeconds === undefined ? null : `marked offline; reading time reported by the phone: ${l.deviceReadingSeconds} s`;
    out.push({ record: "lesson", module: l.module, item: l.lessonTitle, status: "done", date_utc: l.completedAt, reference: l.lesson, details: phone });
  }
  for (const a of r.attempts) {
    out.push({
      record: "attempt",
      module: a.module,
      item: "quiz",
      status: a.status === "graded" ? (a.passed ? "passed" : "not passed") : String(a.status),
      score: a.score,
      date_utc: a.submittedAt ?? a.startedAt,
      reference: a.id,
      details: `pass mark ${a.passMark}`,
    });
  }
  for (const c of r.completions) out.push({ record: "completion", module: c.module, item: "module", status: "complete", date_utc: c.completedAt, reference: c.attemptId });
  const generic = (kind: string, row: RecordRow) => ({
    record: kind,
    module: pick(row, ["moduleSlug", "subjectSlug", "module", "pathSlug"]),
    item: pick(row, ["subjectTitle", "skillId", "title", "skill"]),
    status: pick(row, ["status", "state", "decision"]),
    score: null,
    date_utc: pick(row, ["issuedAt", "reviewedAt", "decidedAt", "submittedAt", "createdAt"]),
    reference: pick(row, ["serial", "code", "id"]),
    details: JSON.stringify(row),
  });
  for (const c of r.certificates) out.push(generic("certificate", c));
  for (const s of r.signOffs) out.push(generic("sign-off", s));
  return toSafeCsv(out, CSV_COLUMNS);
}
