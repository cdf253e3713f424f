import "server-only";
import { and, eq, inArray, isNull, or } from "drizzle-orm";
import { db } from "@/db/client";
import { reminderLog, user } from "@/db/schema";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail";
import { greeting, mailDate, mailTranslator } from "@/lib/mail";
import { itemTitle } from "./board";

/**
 * "New training for you": one mail per person per assigned item, ever (claimed in reminder_log
 * as kind "assigned" before sending; a failed send releases the claim so a later call retries).
 * A due-date change does not mail again; the reminders cover the due date.
 */
export const assignedKey = (kind: string, slug: string) => `assigned:${kind}:${slug}`;

export async function mailAssigned(p: { orgId: string; userIds: string[]; teamIds: string[]; kind: "module" | "path"; slug: string; dueAt: Date; assignedBy: string | null }) {
  const conds = [];
  if (p.userIds.length) conds.push(inArray(user.id, p.userIds));
  if (p.teamIds.length) conds.push(inArray(user.teamId, p.teamIds));
  if (!conds.length) return { sent: 0 };
  const people = await db
    .select({ id: user.id, name: user.name, email: user.email, language: user.language })
    .from(user)
    .where(and(eq(user.organizationId, p.orgId), or(...conds), or(isNull(user.banned), eq(user.banned, false))));
  const key = assignedKey(p.kind, p.slug);
  const title = itemTitle(p.kind, p.slug);
  const link = p.kind === "module" ? `${env.APP_URL}/modules/${p.slug}` : `${env.APP_URL}/modules?path=${p.slug}`;
  let sent = 0;
  for (const person of people) {
    const [claim] = await db.insert(reminderLog).ignore().values({ kind: "assigned", userId: person.id, periodKey: key, sentAt: new Date() });
    if (claim.affectedRows !== 1) continue;
    const t = mailTranslator(person.language);
    const res = await sendMail({
      to: person.email,
      kind: "assigned",
      subject: t("assigned.subject", { title }),
      text: `${greeting(t, person.name)}\n\n${t("assigned.body", { by: p.assignedBy ?? t("assigned.byFallback"), kind: p.kind, title, date: mailDate(person.language, p.dueAt, "weekdayLong"), link })}`,
    });
    if (res.ok) sent++;
    else await db.delete(reminderLog).where(and(eq(reminderLog.kind, "assigned"), eq(reminderLog.userId, person.id), eq(reminderLog.periodKey, key)));
  }
  return { sent };
}
