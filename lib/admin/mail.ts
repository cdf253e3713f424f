import "server-only";
import { and, count, eq, like, or, type SQL } from "drizzle-orm";
import type { z } from "zod";
import { db } from "@/db/client";
import { mailLog } from "@/db/schema";
import { env, isLocalInstance } from "@/lib/env";
import { containing, iso, offsetOf, ordered } from "./paging";
import type { mailQuery, Paged } from "./schemas";

export type MailRow = { id: number; at: string | null; to: string; subject: string; kind: string; status: string; error: string | null; body?: string | null };

/** Message bodies are kept only on a local instance (lib/mail); even there the log shows them with links removed. */
export const mailBodiesVisible = () => isLocalInstance(env);

/** Every web address in a body replaced, so the log never hands out a reset, invitation or sign-in link. */
export const redactLinks = (text: string) => text.replace(/\b(?:https?:\/\/|www\.)[^\s<>"')\]]+/gi, "[link removed]");

export async function listMail(q: z.infer<typeof mailQuery>): Promise<Paged<MailRow> & { bodiesVisible: boolean }> {
  const filters: (SQL | undefined)[] = [];
  if (q.q) filters.push(or(like(mailLog.to, containing(q.q)), like(mailLog.subject, containing(q.q))));
  if (q.status) filters.push(eq(mailLog.status, q.status));
  const where = and(...filters);
  const bodiesVisible = mailBodiesVisible();
  const sortColumn = { at: mailLog.at, to: mailLog.to, subject: mailLog.subject, status: mailLog.status }[q.sort];
  const rows = await db
    .select({ id: mailLog.id, at: mailLog.at, to: mailLog.to, subject: mailLog.subject, kind: mailLog.kind, status: mailLog.status, error: mailLog.error, body: mailLog.body })
    .from(mailLog)
    .where(where)
    .orderBy(ordered(sortColumn, q.dir), ordered(mailLog.id, q.dir))
    .limit(q.pageSize)
    .offset(offsetOf(q));
  const [total] = await db.select({ n: count() }).from(mailLog).where(where);
  return {
    rows: rows.map(({ body, ...r }) => ({ ...r, at: iso(r.at), ...(bodiesVisible ? { body: body == null ? null : redactLinks(body) } : {}) })),
    total: total?.n ?? 0,
    page: q.page,
    pageSize: q.pageSize,
    bodiesVisible,
  };
}
