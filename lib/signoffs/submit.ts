import "server-only";
/**
 * A learner's submission: read the multipart body whole, check every file by its content, store
 * the prepared files (and thumbnails) in the object store, then write the sign-off, its evidence
 * rows and the audit row in one transaction. If that transaction fails, the stored objects are
 * deleted again; whatever a crash leaves behind, the orphan cleanup job (cleanup.ts) removes.
 */
import { randomUUID } from "node:crypto";
import { and, eq, isNull, or } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { signOff, signOffEvidence, user } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { fieldErrorsOf } from "@/lib/api";
import { audit } from "@/lib/audit";
import { hitRateLimit } from "@/lib/rate-limit";
import { findModule } from "@/lib/content";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail";
import { mailTranslator } from "@/lib/mail";
import { deleteObjectsQuietly, isStorageDown, putObject } from "@/lib/storage";
import { EvidenceError, prepareEvidence, type PreparedEvidence } from "./evidence";
import { evidenceKeys } from "./keys";
import { MAX_FILES, MAX_UPLOAD_BYTES, MAX_UPLOAD_LABEL, formatBytes, submitFields, type SubmitFields } from "./schemas";
import { plural } from "@/lib/plural";

/** Room for the form's other fields and the multipart boundaries on top of the files themselves. */
const MULTIPART_OVERHEAD = 64 * 1024;

const INCOMPLETE = "The upload did not arrive complete — the connection may have dropped part-way. Nothing was stored; try again.";

export type Upload = { fields: SubmitFields; files: File[] };

/** Uploads one person may send per window (every app server counts in MariaDB). */
export const UPLOADS_PER_WINDOW = 20;
export const UPLOAD_WINDOW_S = 3600;

/**
 * Counts this upload against the person's allowance before any of its body is read; over it, a
 * "too-many" error that the API layer answers with 429 and Retry-After. Per person, not per address
 * (offices share one).
 */
export async function assertUploadAllowed(viewer: Viewer): Promise<void> {
  const r = await hitRateLimit(`evidence-upload:${viewer.id}`, UPLOADS_PER_WINDOW, UPLOAD_WINDOW_S);
  if (r.allowed) return;
  const mins = Math.max(1, Math.ceil(r.retryAfterSeconds / 60));
  throw new DomainError(
    "too-many",
    `You have sent ${UPLOADS_PER_WINDOW} uploads within an hour, the most Riser takes. Try again in ${plural(mins, "minute")}; nothing was saved.`,
    undefined,
    { retryAfterSeconds: r.retryAfterSeconds },
  );
}

/** Reads the request's multipart form; anything short of a whole, well-formed body is a 4xx. */
export async function readUpload(req: Request): Promise<Upload> {
  const type = req.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data;/i.test(type)) {
    throw new DomainError("invalid", "Send the evidence as a file upload form (multipart/form-data) with the module, the skill and the files.");
  }
  const declared = Number(req.headers.get("content-length") ?? NaN);
  if (Number.isFinite(declared) && declared > MAX_UPLOAD_BYTES + MULTIPART_OVERHEAD) {
    throw new DomainError("too-large", `That upload is ${formatBytes(declared)}; the limit is ${MAX_UPLOAD_LABEL} for all files together. Send fewer or smaller files.`, {
      files: [`Up to ${MAX_UPLOAD_LABEL} in all.`],
    });
  }
  let form: FormData;
  try {
    form = await req.formData();
  } catch {
    throw new DomainError("invalid", INCOMPLETE, { files: [INCOMPLETE] });
  }
  const parsed = submitFields.safeParse({
    module: form.get("module") ?? undefined,
    skill: form.get("skill") ?? undefined,
    note: typeof form.get("note") === "string" ? form.get("note") : undefined,
  });
  if (!parsed.success) throw new DomainError("invalid", "Some fields need attention.", fieldErrorsOf(parsed.error));
  const files = [...form.getAll("files"), ...form.getAll("file")].filter((v): v is File => typeof v !== "string");
  return { fields: parsed.data, files };
}

export type SubmittedSignOff = {
  id: string;
  status: "submitted";
  module: string;
  skill: string;
  evidence: { id: string; name: string; contentType: string; size: number; thumbnail: boolean }[];
};

function fileProblem(status: number, message: string): never {
  throw DomainError.fromStatus(status, message, { files: [message] });
}

function isDuplicate(err: unknown): boolean {
  for (let e: unknown = err, i = 0; e && i < 5; i++) {
    if ((e as { code?: string }).code === "ER_DUP_ENTRY") return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

const activeKeyOf = (userId: string, moduleSlug: string, skillId: string) => `${userId}|${moduleSlug}|${skillId}`;

export async function submitSignOff(viewer: Viewer, upload: Upload, ip: string | null): Promise<SubmittedSignOff> {
  const { fields, files } = upload;
  const mod = findModule(fields.module);
  if (!mod) throw new DomainError("not-found", `No module "${fields.module}".`, { module: ["No such module."] });
  const skill = mod.skills.find((s) => s.id === fields.skill);
  if (!skill) throw new DomainError("invalid", `"${mod.meta.title}" has no skill "${fields.skill}".`, { skill: ["No such skill in this module."] });

  if (!files.length) fileProblem(400, "Choose at least one photo or PDF.");
  if (files.length > MAX_FILES) fileProblem(400, `Send up to ${MAX_FILES} files with one sign-off (you chose ${files.length}).`);
  const total = files.reduce((n, f) => n + f.size, 0);
  if (total > MAX_UPLOAD_BYTES) fileProblem(413, `These files come to ${formatBytes(total)}; the limit is ${MAX_UPLOAD_LABEL} in all. Send fewer or smaller files.`);

  const live = await db
    .select({ status: signOff.status })
    .from(signOff)
    .where(eq(signOff.activeKey, activeKeyOf(viewer.id, mod.slug, skill.id)))
    .limit(1);
  if (live[0]) throw liveConflict(live[0].status);

  const prepared: PreparedEvidence[] = [];
  for (const f of files) {
    try {
      prepared.push(await prepareEvidence(f.name, new Uint8Array(await f.arrayBuffer())));
    } catch (err) {
      if (err instanceof EvidenceError) fileProblem(err.status, err.message);
      throw err;
    }
  }

  const id = randomUUID();
  const now = new Date();
  const rows = prepared.map((p, position) => {
    const evidenceId = randomUUID();
    const keys = evidenceKeys(viewer.id, id, evidenceId, p.ext, Boolean(p.thumbnail));
    return { p, row: { id: evidenceId, signOffId: id, position, ...keys, contentType: p.contentType, size: p.body.byteLength, originalName: p.displayName, createdAt: now } };
  });

  const stored: string[] = [];
  try {
    for (const { p, row } of rows) {
      await putObject(row.objectKey, p.body, p.contentType);
      stored.push(row.objectKey);
      if (row.thumbnailKey && p.thumbnail) {
        await putObject(row.thumbnailKey, p.thumbnail, "image/jpeg");
        stored.push(row.thumbnailKey);
      }
    }
  } catch (err) {
    await deleteObjectsQuietly(stored);
    if (isStorageDown(err)) throw new DomainError("unavailable", "The file store is not reachable right now. Nothing was saved; try again in a minute.");
    throw err;
  }

  try {
    await db.transaction(async (tx) => {
      await tx.insert(signOff).values({
        id,
        userId: viewer.id,
        organizationId: viewer.organizationId,
        moduleSlug: mod.slug,
        skillId: skill.id,
        status: "submitted",
        note: fields.note,
        activeKey: activeKeyOf(viewer.id, mod.slug, skill.id),
        submittedAt: now,
      });
      await tx.insert(signOffEvidence).values(rows.map((r) => r.row));
      await audit(
        {
          actor: viewer,
          organizationId: viewer.organizationId,
          action: "signoff.submit",
          targetType: "sign-off",
          targetId: id,
          ip,
          details: { module: mod.slug, skill: skill.id, files: rows.map((r) => ({ type: r.row.contentType, size: r.row.size, receivedAs: r.p.receivedAs })) },
        },
        tx,
      );
      // the reviewers' notice is queued with the sign-off: it exists exactly when the sign-off does
      await notifyReviewers(tx, viewer, id, mod.meta.title, skill.title);
    });
  } catch (err) {
    await deleteObjectsQuietly(stored);
    if (isDuplicate(err)) {
      const [again] = await db.select({ status: signOff.status }).from(signOff).where(eq(signOff.activeKey, activeKeyOf(viewer.id, mod.slug, skill.id)));
      throw liveConflict(again?.status ?? "submitted");
    }
    throw err;
  }

  return {
    id,
    status: "submitted",
    module: mod.slug,
    skill: skill.id,
    evidence: rows.map((r) => ({ id: r.row.id, name: r.row.originalName, contentType: r.row.contentType, size: r.row.size, thumbnail: Boolean(r.row.thumbnailKey) })),
  };
}

function liveConflict(status: string): DomainError {
  return status === "approved"
    ? new DomainError("conflict", "This skill is already signed off for you.")
    : new DomainError("conflict", "A sign-off for this skill is already waiting for review. You can send new evidence if it is returned.");
}

/** Tells the learner's organization's managers that something waits in their queue (queued in `tx`). */
async function notifyReviewers(tx: Tx, viewer: Viewer, signOffId: string, moduleTitle: string, skillTitle: string): Promise<void> {
  if (!viewer.organizationId) return;
  const managers = await tx
    .select({ email: user.email, language: user.language })
    .from(user)
    .where(and(eq(user.organizationId, viewer.organizationId), eq(user.role, "manager"), or(isNull(user.banned), eq(user.banned, false))));
  for (const m of managers.filter((x) => x.email !== viewer.email)) {
    const t = mailTranslator(m.language);
    await sendMail({
      to: m.email,
      subject: t("signoff.submittedSubject", { learner: viewer.name }),
      text: `${t("signoff.submittedBody", { learner: viewer.name, module: moduleTitle, skill: skillTitle, link: `${env.APP_URL}/team/sign-offs` })}\n`,
      kind: "signoff-submitted",
      key: `signoff-submitted:${signOffId}:${m.email}`,
    }, tx);
  }
}
