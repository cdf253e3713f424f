import "server-only";
import { and, eq, gte, inArray, lte, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { assignment, moduleCompletion, organization, reminderLog, user } from "@/db/schema";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail";
import { greeting, mailDate, mailTranslator } from "@/lib/mail";
import { itemModules, itemTitle, passedModules, type Person } from "./board";
import { teamTotals } from "./summary";
import { isoWeek } from "./period";
import { addDays, isoDay } from "@/lib/dates";
import { refresherCountFor } from "@/lib/refreshers";

export { isoWeek };

/**
 * Reminder jobs, safe to run any number of times: each mail is claimed in reminder_log first
 * (INSERT IGNORE on a unique key naming the item and the period), and sent only by the run that
 * won the claim. A failed send releases its claim so that the next run retries it.
 *   overdue   once per ISO week per assignment, while it stays overdue
 *   due-soon  once per assignment and due date, when it falls due within 3 days
 *   digest    once per ISO week per manager
 */

export const DUE_SOON_DAYS = 3;
/** Mails in flight at once (a large organization's first run can mean thousands). */
const SEND_CONCURRENCY = 8;

async function inParallel<T>(items: T[], fn: (item: T) => Promise<void>): Promise<void> {
  let next = 0;
  await Promise.all(
    Array.from({ length: Math.min(SEND_CONCURRENCY, items.length) }, async () => {
      for (let i = next++; i < items.length; i = next++) await fn(items[i]!);
    }),
  );
}

async function claim(kind: string, userId: string, periodKey: string, now: Date): Promise<boolean> {
  const [res] = await db.insert(reminderLog).ignore().values({ kind, userId, periodKey, sentAt: now });
  return res.affectedRows === 1;
}
async function release(kind: string, userId: string, keys: string[]) {
  if (keys.length) await db.delete(reminderLog).where(and(eq(reminderLog.kind, kind), eq(reminderLog.userId, userId), inArray(reminderLog.periodKey, keys)));
}

type Candidate = { assignmentId: number; kind: string; slug: string; dueAt: Date; person: Person };

/** Effective assignments (direct and through the current team) due on or before `until`. */
async function dueAssignments(until: Date): Promise<Candidate[]> {
  const [rows] = (await db.execute(sql`
SELECT a.id, a.kind, a.target_slug, a.due_at, u.id AS user_id, u.name, u.email, u.role, u.team_id, u.organization_id, u.language
FROM assignment a JOIN user u ON u.id = a.user_id AND u.organization_id = a.organization_id
WHERE a.user_id IS NOT NULL AND a.due_at <= ${until} AND (u.banned IS NULL OR u.banned = 0)
UNION ALL
SELECT a.id, a.kind, a.target_slug, a.due_at, u.id AS user_id, u.name, u.email, u.role, u.team_id, u.organization_id, u.language
FROM assignment a JOIN user u ON u.team_id = a.team_id AND u.organization_id = a.organization_id
WHERE a.team_id IS NOT NULL AND a.due_at <= ${until} AND (u.banned IS NULL OR u.banned = 0) AND u.role <> 'admin'`)) as unknown as [Record<string, unknown>[]];
  return rows.map((r) => ({
    assignmentId: Number(r.id),
    kind: String(r.kind),
    slug: String(r.target_slug),
    dueAt: r.due_at instanceof Date ? r.due_at : new Date(String(r.due_at)),
    person: {
      id: String(r.user_id),
      name: String(r.name),
      email: String(r.email),
      role: String(r.role),
      teamId: (r.team_id as string | null) ?? null,
      team: null,
      organizationId: String(r.organization_id),
      language: String(r.language ?? "en"),
    },
  }));
}

/** Overdue and due-soon mails to learners. */
export async function sendDueReminders({ now = new Date() }: { now?: Date } = {}) {
  const candidates = await dueAssignments(addDays(now, DUE_SOON_DAYS));
  const people = new Map<string, Person>();
  for (const c of candidates) people.set(c.person.id, c.person);
  const done = await passedModules([...people.values()], now);
  const week = isoWeek(now);
  const open: (Candidate & { key: string; reminder: "overdue" | "due-soon" })[] = [];
  for (const c of candidates) {
    const mods = itemModules(c.kind, c.slug);
    const passed = done.get(c.person.id) ?? new Set();
    if (mods.length > 0 && mods.every((m) => passed.has(m))) continue;
    const reminder = c.dueAt.getTime() < now.getTime() ? "overdue" : "due-soon";
    open.push({ ...c, reminder, key: reminder === "overdue" ? `a${c.assignmentId}:${week}` : `a${c.assignmentId}:${isoDay(c.dueAt)}` });
  }
  // Claims already taken (a repeat run skips them without an INSERT each).
  const taken = new Set<string>();
  for (let i = 0; i < open.length; i += 1000) {
    const chunk = open.slice(i, i + 1000);
    const rows = await db
      .select({ kind: reminderLog.kind, userId: reminderLog.userId, periodKey: reminderLog.periodKey })
      .from(reminderLog)
      .where(
        and(
          inArray(reminderLog.kind, ["overdue", "due-soon"]),
          inArray(reminderLog.userId, [...new Set(chunk.map((c) => c.person.id))]),
          inArray(reminderLog.periodKey, [...new Set(chunk.map((c) => c.key))]),
        ),
      );
    for (const r of rows) taken.add(`${r.kind}/${r.userId}/${r.periodKey}`);
  }
  const claimed = new Map<string, { person: Person; kind: "overdue" | "due-soon"; items: (Candidate & { key: string })[] }>();
  for (const c of open) {
    if (taken.has(`${c.reminder}/${c.person.id}/${c.key}`) || !(await claim(c.reminder, c.person.id, c.key, now))) continue;
    const k = `${c.person.id}/${c.reminder}`;
    const entry = claimed.get(k) ?? { person: c.person, kind: c.reminder, items: [] };
    entry.items.push(c);
    claimed.set(k, entry);
  }
  let sent = 0;
  let failed = 0;
  await inParallel([...claimed.values()], async ({ person, kind, items }) => {
    items.sort((a, b) => a.dueAt.getTime() - b.dueAt.getTime());
    const t = mailTranslator(person.language);
    const lines = items.map((i) => {
      const link = i.kind === "module" ? `${env.APP_URL}/modules/${i.slug}` : `${env.APP_URL}/modules?path=${i.slug}`;
      const date = mailDate(person.language, i.dueAt, "weekdayLong");
      return `${t("reminder.line", { title: itemTitle(i.kind, i.slug), kind: i.kind, overdue: kind === "overdue" ? "yes" : "no", date })}\n  ${link}`;
    });
    const what = items.length === 1 ? itemTitle(items[0]!.kind, items[0]!.slug) : t("reminder.items", { count: items.length });
    const subject = kind === "overdue" ? t("reminder.overdueSubject", { what }) : t("reminder.dueSoonSubject", { what });
    const intro = kind === "overdue" ? t("reminder.overdueIntro") : t("reminder.dueSoonIntro", { days: DUE_SOON_DAYS });
    const res = await sendMail({
      to: person.email,
      kind: `reminder-${kind}`,
      subject,
      text: `${greeting(t, person.name)}\n\n${t("reminder.body", { intro, lines: lines.join("\n"), url: `${env.APP_URL}/learn` })}`,
    });
    if (res.ok) sent++;
    else {
      failed++;
      await release(
        kind,
        person.id,
        items.map((i) => i.key),
      );
    }
  });
  return { candidates: candidates.length, sent, failed };
}

/** Weekly digest to each manager: totals per team, overdue and expiring counts, last week's completions. */
export async function sendManagerDigests({ now = new Date() }: { now?: Date } = {}) {
  const managers = await db
    .select({ id: user.id, name: user.name, email: user.email, language: user.language, organizationId: user.organizationId, orgName: organization.name })
    .from(user)
    .innerJoin(organization, eq(organization.id, user.organizationId))
    .where(and(eq(user.role, "manager"), sql`(${user.banned} IS NULL OR ${user.banned} = 0)`));
  const week = isoWeek(now);
  const byOrg = new Map<string, typeof managers>();
  for (const m of managers) byOrg.set(m.organizationId!, [...(byOrg.get(m.organizationId!) ?? []), m]);
  let sent = 0;
  let failed = 0;
  for (const [orgId, list] of byOrg) {
    const mine: typeof list = [];
    for (const m of list) if (await claim("digest", m.id, `digest:${week}`, now)) mine.push(m);
    if (mine.length === 0) continue;
    const totals = await teamTotals({ orgId, orgName: null }, now);
    const weekAgo = addDays(now, -7);
    const [done] = await db
      .select({ n: sql<number>`COUNT(*)` })
      .from(moduleCompletion)
      .innerJoin(user, eq(user.id, moduleCompletion.userId))
      .where(and(eq(user.organizationId, orgId), gte(moduleCompletion.completedAt, weekAgo), lte(moduleCompletion.completedAt, now)));
    const [openAssignments] = await db
      .select({ n: sql<number>`COUNT(*)` })
      .from(assignment)
      .where(and(eq(assignment.organizationId, orgId), gte(assignment.dueAt, now), lte(assignment.dueAt, addDays(now, 7))));
    const [newlyAssigned] = await db
      .select({ n: sql<number>`COUNT(*)` })
      .from(assignment)
      .where(and(eq(assignment.organizationId, orgId), gte(assignment.createdAt, weekAgo), lte(assignment.createdAt, now)));
    const refreshers = await refresherCountFor(orgId);
    const sum = (k: "people" | "overdue" | "expiring" | "expired") => totals.reduce((n, t) => n + t[k], 0);
    for (const m of mine) {
      const t = mailTranslator(m.language);
      const lines = totals.map((x) =>
        t("digest.line", { team: x.teamId === null ? t("digest.noTeam") : x.team, people: x.people, passed: x.passed, cells: x.cells, pct: x.cells ? Math.round((x.passed / x.cells) * 100) : 0, overdue: x.overdue, expiring: x.expiring }),
      );
      const res = await sendMail({
        to: m.email,
        kind: "digest",
        subject: t("digest.subject", { org: m.orgName, week }),
        text: `${greeting(t, m.name)}\n\n${t("digest.body", {
          org: m.orgName,
          week,
          lines: lines.join("\n") || t("digest.noPeople"),
          overdue: sum("overdue"),
          expiring: sum("expiring"),
          expired: sum("expired"),
          refreshers,
          done: Number(done?.n ?? 0),
          due: Number(openAssignments?.n ?? 0),
          assigned: Number(newlyAssigned?.n ?? 0),
          url: `${env.APP_URL}/team`,
        })}`,
      });
      if (res.ok) sent++;
      else {
        failed++;
        await release("digest", m.id, [`digest:${week}`]);
      }
    }
  }
  return { managers: managers.length, sent, failed };
}
