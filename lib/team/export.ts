import "server-only";
import { and, asc, eq, gt, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { certificate, team, user } from "@/db/schema";
import { certificateStatus } from "@/lib/certificates";
import { boardModules, boardRowsInChunks, type BoardFilter } from "./board";
import { csvResponse } from "@/lib/csv";
import { withCellExtras } from "./board-extras";
import { STATUS_LABELS } from "./schemas";
import type { OrgScope } from "@/lib/access";
import { isDone } from "./status";
import { isoDay } from "@/lib/dates";
import { isExpiring } from "@/lib/expiring";
import { catalogTranslator, type Locale } from "@/lib/i18n";

const day = (iso: string | null | undefined) => isoDay(iso);
const stamp = () => isoDay(new Date());

/**
 * The filtered board as CSV: one row per person; per module its status, completion date, best
 * score, certificate serial and due date (five columns, so a spreadsheet can sort and filter each).
 */
export async function boardCsv(scope: OrgScope, f: BoardFilter, language: Locale = "en"): Promise<Response> {
  const modules = boardModules(f.module);
  // the column headers in the downloader's language (module titles too); the cells stay as they are
  const t = catalogTranslator(language, "team");
  const titles = new Map(boardModules(f.module, language).map((m) => [m.slug, m.title]));
  const perModule = (title: string) => [title, t("csv.completed", { title }), t("csv.score", { title }), t("csv.certificate", { title }), t("csv.due", { title })];
  const header = [t("csv.name"), t("csv.email"), t("csv.team"), ...modules.flatMap((m) => perModule(titles.get(m.slug) ?? m.title)), t("csv.passed"), t("csv.overdue"), t("csv.nextDue"), t("csv.language")];
  return csvResponse(`riser-team-board-${stamp()}.csv`, header, async function* () {
    for await (const chunk of boardRowsInChunks(scope, f)) {
      const rich = await withCellExtras(chunk);
      yield rich.map((r) => [
        r.name,
        r.email,
        r.team ?? "",
        ...modules.flatMap((m) => {
          const c = r.cells[m.slug];
          if (!c) return ["", "", "", "", ""];
          const label = STATUS_LABELS[c.status];
          const waiting = (c.waitingSignOffs ? "; sign-off waiting for review" : "") + (c.refresherDue ? "; refresher due" : "");
          const status =
            c.status === "expiring" || c.status === "expired"
              ? `${label} (${day(c.expiresAt)})`
              : !isDone(c.status) && c.dueAt
                ? `${label} (due ${day(c.dueAt)}${waiting})`
                : `${label}${waiting ? ` (${waiting.slice(2)})` : ""}`;
          return [status, day(c.completedAt), c.bestScore === null ? "" : `${c.bestScore}%`, c.serial ?? "", isDone(c.status) ? "" : day(c.dueAt)];
        }),
        r.passed,
        r.overdue,
        day(r.nextDue),
        r.language ?? "",
      ]);
    }
  });
}

/** Certificates earned in the scope's organization(s), holder by holder, streamed in pages. */
export async function certificatesCsv(scope: OrgScope): Promise<Response> {
  const header = ["Serial", "Holder", "E-mail", "Team", ...(scope.orgId ? [] : ["Organization"]), "Kind", "Module or path", "CE hours", "Issued", "Expires", "Status"];
  const now = new Date();
  return csvResponse(`riser-certificates-${stamp()}.csv`, header, async function* () {
    let after = 0;
    for (;;) {
      const page = await db
        .select({
          id: certificate.id,
          serial: certificate.serial,
          holder: certificate.holderName,
          email: user.email,
          team: team.name,
          org: certificate.organizationName,
          kind: certificate.kind,
          title: certificate.subjectTitle,
          ceHours: certificate.ceHours,
          issuedAt: certificate.issuedAt,
          expiresAt: certificate.expiresAt,
          revokedAt: certificate.revokedAt,
        })
        .from(certificate)
        .leftJoin(user, eq(user.id, certificate.userId))
        .leftJoin(team, eq(team.id, user.teamId))
        .where(and(scope.orgId ? eq(certificate.organizationId, scope.orgId) : sql`${certificate.organizationId} IS NOT NULL`, gt(certificate.id, after)))
        .orderBy(asc(certificate.id))
        .limit(1000);
      if (page.length === 0) return;
      after = page[page.length - 1]!.id;
      yield page.map((c) => {
        const status = certificateStatus(c, now);
        const label = status === "revoked" ? "Revoked" : status === "expired" ? "Expired" : isExpiring(c.expiresAt, now) ? "Valid, expiring soon" : "Valid";
        return [
          c.serial,
          c.holder,
          c.email ?? "",
          c.team ?? "",
          ...(scope.orgId ? [] : [c.org ?? ""]),
          c.kind === "path" ? "Learning path" : "Module",
          c.title,
          c.ceHours,
          isoDay(c.issuedAt),
          isoDay(c.expiresAt),
          label,
        ];
      });
    }
  });
}
