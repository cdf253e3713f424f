import "server-only";
import { hostname } from "node:os";
import nodemailer from "nodemailer";
import { and, desc, eq, inArray, isNull, lte, lt, notInArray, or, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { mailLog, mailOutbox } from "@/db/schema";
import { env, isLocalInstance } from "@/lib/env";
import { log, withLogContext } from "@/lib/log";
import { metrics } from "@/lib/metrics";

/**
 * Delivery of the mail outbox. Every message is a row (lib/mail sendMail); `deliverOutbox` claims due
 * rows one at a time (an UPDATE that only one worker can win, so two servers never send one row at
 * once), sends it with bounded SMTP timeouts and marks it sent together with its mail-log row. A
 * failure is retried with exponential backoff (5 s, 10 s, 20 s … capped at one hour) up to
 * MAX_TRIES, then marked failed in the outbox and the mail log. The SMTP Message-ID is derived from
 * the row id, so a resend after a crash between "accepted" and "marked sent" carries the same id.
 */
export const MAX_TRIES = 12;
export const RETRY_BASE_MS = 5_000;
const RETRY_CAP_MS = 3_600_000;
const CLAIM_MS = 90_000; // longer than the worst SMTP exchange below
/** Messages sent at once by one process. */
const PARALLEL = 4;
/**
 * Bulk kinds (invitation runs, reminders, digests) go after the messages someone is waiting for
 * (confirmation links, password resets, certificates, receipts); within a class the newest first,
 * so a fresh message never queues behind a backlog of thousands.
 */
const BULK_KINDS = ["invite", "digest", "reminder-overdue", "reminder-due-soon", "certificate.expiry-reminder"];
const TIMEOUTS = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000, dnsTimeout: 10_000 };

const local = /^smtp:\/\/(127\.0\.0\.1|localhost)(:|\/|$)/.test(env.SMTP_URL);
// The local catcher's certificate is not trusted: plain SMTP on loopback only.
// Pooled: a few SMTP connections reused for many messages (a bulk invitation run is thousands).
const transport = nodemailer.createTransport({ url: env.SMTP_URL, pool: true, maxConnections: PARALLEL, maxMessages: 100, ...TIMEOUTS, ...(local ? { ignoreTLS: true } : {}) } as Parameters<
  typeof nodemailer.createTransport
>[0]);

// Bodies (reset and invitation links) are kept after sending only on a local instance (RISER_LOCAL=1 on a
// loopback APP_URL), the same rule that shows them in the admin mail log (lib/admin/mail.ts).
const keepBody = isLocalInstance(env);
const messageDomain = (() => {
  try {
    return new URL(env.APP_URL).hostname || hostname();
  } catch {
    return hostname();
  }
})();

export function backoffMs(tries: number): number {
  return Math.min(RETRY_BASE_MS * 2 ** Math.max(0, tries - 1), RETRY_CAP_MS);
}

export function isDuplicateKey(err: unknown): boolean {
  for (let e: unknown = err; e && typeof e === "object"; e = (e as { cause?: unknown }).cause) {
    if ((e as { code?: string }).code === "ER_DUP_ENTRY") return true;
  }
  return false;
}

type Row = typeof mailOutbox.$inferSelect;

async function claim(id: number, now: Date): Promise<boolean> {
  const r = await db
    .update(mailOutbox)
    .set({ claimedUntil: new Date(now.getTime() + CLAIM_MS) })
    .where(
      and(
        eq(mailOutbox.id, id),
        eq(mailOutbox.status, "pending"),
        lte(mailOutbox.nextAttemptAt, now),
        or(isNull(mailOutbox.claimedUntil), lt(mailOutbox.claimedUntil, now)),
      ),
    );
  return r[0].affectedRows === 1;
}

async function deliverOne(row: Row): Promise<"sent" | "retry" | "failed"> {
  let error: string | null = null;
  try {
    await transport.sendMail({
      from: env.MAIL_FROM,
      to: row.to,
      subject: row.subject,
      text: row.body,
      messageId: `<riser-outbox-${row.id}@${messageDomain}>`,
    });
  } catch (err) {
    error = (err instanceof Error ? err.message : String(err)).slice(0, 2000);
  }
  const tries = row.tries + 1;
  if (!error) {
    await db.transaction(async (tx) => {
      await tx
        .update(mailOutbox)
        .set({ status: "sent", tries, sentAt: new Date(), claimedUntil: null, lastError: null, ...(keepBody ? {} : { body: "" }) })
        .where(eq(mailOutbox.id, row.id));
      await tx.insert(mailLog).values({ to: row.to, subject: row.subject, kind: row.kind, status: "sent", error: null, body: keepBody ? row.body : null });
    });
    metrics.mail.inc({ outcome: "sent" });
    log().debug({ outboxId: row.id, kind: row.kind, tries }, "mail sent"); // counted in riser_mail_total; failures log at warn/error
    return "sent";
  }
  const final = tries >= MAX_TRIES;
  metrics.mail.inc({ outcome: final ? "failed" : "retry" });
  // the recipient is never logged: the outbox row id finds it in the admin mail log
  log()[final ? "error" : "warn"]({ outboxId: row.id, kind: row.kind, tries, error, final }, final ? "mail failed; giving up" : "mail try failed; will retry");
  await db.transaction(async (tx) => {
    await tx
      .update(mailOutbox)
      .set({ status: final ? "failed" : "pending", tries, lastError: error, claimedUntil: null, nextAttemptAt: new Date(Date.now() + backoffMs(tries)) })
      .where(eq(mailOutbox.id, row.id));
    if (final) await tx.insert(mailLog).values({ to: row.to, subject: row.subject, kind: row.kind, status: "failed", error, body: keepBody ? row.body : null });
  });
  return final ? "failed" : "retry";
}

export type OutboxRun = { sent: number; retrying: number; failed: number };

/** Sends every due message (up to `limit`); safe to run on several servers and twice at once. */
export async function deliverOutbox(limit = 500): Promise<OutboxRun> {
  const out: OutboxRun = { sent: 0, retrying: 0, failed: 0 };
  const seen = new Set<number>();
  while (seen.size < limit) {
    const now = new Date();
    // rows handled in this run are claimed, sent or rescheduled, so they drop out of this query
    const due = await db
      .select()
      .from(mailOutbox)
      .where(
        and(
          eq(mailOutbox.status, "pending"),
          lte(mailOutbox.nextAttemptAt, now),
          or(isNull(mailOutbox.claimedUntil), lt(mailOutbox.claimedUntil, now)),
          seen.size ? notInArray(mailOutbox.id, [...seen]) : undefined,
        ),
      )
      .orderBy(sql`CASE WHEN ${inArray(mailOutbox.kind, BULK_KINDS)} THEN 1 ELSE 0 END`, desc(mailOutbox.id))
      .limit(PARALLEL * 5);
    if (!due.length) break;
    for (const r of due) seen.add(r.id);
    let next = 0;
    const lane = async () => {
      for (let row = due[next++]; row; row = due[next++]) {
        if (!(await claim(row.id, now))) continue;
        const r = await deliverOne(row);
        if (r === "sent") out.sent++;
        else if (r === "retry") out.retrying++;
        else out.failed++;
      }
    };
    await Promise.all(Array.from({ length: PARALLEL }, lane));
  }
  return out;
}

// In-process scheduling: one drain at a time per process; a request's enqueue asks for one soon.
const state = globalThis as unknown as { riserOutbox?: { running: boolean; again: boolean; timer: NodeJS.Timeout | null; lastErrorLog: number } };
const s = (state.riserOutbox ??= { running: false, again: false, timer: null, lastErrorLog: 0 });

export async function drainNow(): Promise<void> {
  if (s.running) {
    s.again = true;
    return;
  }
  s.running = true;
  try {
    do {
      s.again = false;
      await withLogContext({ worker: "mail-outbox", runId: crypto.randomUUID() }, () => deliverOutbox());
    } while (s.again);
  } catch (err) {
    // the database may be down: the interval tries again; log at most once a minute
    if (Date.now() - s.lastErrorLog > 60_000) {
      s.lastErrorLog = Date.now();
      log().error({ worker: "mail-outbox", error: err instanceof Error ? err.message : String(err) }, "mail outbox delivery paused");
    }
  } finally {
    s.running = false;
  }
}

/** Asks for a delivery run after `ms` (requests never wait for it). */
export function scheduleDelivery(ms: number): void {
  if (s.timer) return;
  s.timer = setTimeout(() => {
    s.timer = null;
    void drainNow();
  }, ms);
  s.timer.unref?.();
}
