"use client";
import Link from "next/link";
import { useFormatter, useTranslations } from "next-intl";
import type { RichCell } from "@/lib/team";
import { StatusBadge } from "./status-badge";


/**
 * One board cell: the status badge, what needs the manager ("waiting for your review"), the due or
 * end date; its details open on tap or Enter (a disclosure, not a hover-only tooltip).
 */
export function BoardCellView({ cell, person, module, personId }: { cell: RichCell; person: string; module: string; personId: string }) {
  const t = useTranslations("team");
  const format = useFormatter();
  const shortDate = (iso: string) => format.dateTime(new Date(iso), { month: "short", day: "numeric", year: "numeric", timeZone: "UTC" });
  const done = cell.status === "passed" || cell.status === "expiring";
  return (
    <details className="group relative" data-testid="board-cell">
      <summary className="flex cursor-pointer list-none flex-col items-start gap-0.5 rounded p-0.5 focus-visible:outline focus-visible:outline-2" aria-label={t("cell.label", { person, module, status: t(`status.${cell.status}`), waiting: cell.waitingSignOffs ? "yes" : "no", refresher: cell.refresherDue ? "yes" : "no" })}>
        <StatusBadge status={cell.status} compact />
        {cell.waitingSignOffs ? <span className="whitespace-nowrap text-xs font-bold text-copper">{t("cell.waiting")}</span> : null}
        {cell.refresherDue ? <span className="whitespace-nowrap text-xs font-bold text-copper" data-testid="refresher-due">{t("cell.refresher")}</span> : null}
        {!done && cell.dueAt ? <span className="whitespace-nowrap text-xs text-muted">{t("cell.dueShort", { date: shortDate(cell.dueAt) })}</span> : null}
        {(cell.status === "expiring" || cell.status === "expired") && cell.expiresAt ? (
          <span className="whitespace-nowrap text-xs text-muted">{cell.status === "expired" ? t("cell.ended", { date: shortDate(cell.expiresAt) }) : t("cell.ends", { date: shortDate(cell.expiresAt) })}</span>
        ) : null}
      </summary>
      <div className="absolute left-0 top-full z-20 mt-1 w-64 rounded border border-line bg-panel p-3 text-xs shadow-lg">
        <p className="font-bold">{module}</p>
        <ul className="mt-1 flex flex-col gap-0.5">
          <li>{t("cell.lessons", { done: cell.lessonsDone, total: cell.lessonsTotal })}</li>
          <li>{t("cell.attempts", { count: cell.attempts })}{cell.bestScore !== null ? ` · ${t("cell.best", { score: cell.bestScore })}` : ""}</li>
          {cell.completedAt ? <li>{t("cell.completed", { date: shortDate(cell.completedAt) })}</li> : null}
          {cell.serial ? <li>{t.rich("cell.certificate", { serial: cell.serial, mono: (c) => <span className="font-mono">{c}</span> })}</li> : null}
          {cell.dueAt ? <li>{t("cell.due", { date: shortDate(cell.dueAt) })}</li> : null}
          {cell.expiresAt ? <li>{t("cell.validUntil", { date: shortDate(cell.expiresAt) })}</li> : null}
        </ul>
        <p className="mt-2 flex flex-wrap gap-3">
          {cell.waitingSignOffs ? <Link href="/team/sign-offs" className="inline-flex min-h-6 items-center">{t("cell.review")}</Link> : null}
          <Link href={`/team/people/${personId}`} className="inline-flex min-h-6 items-center">{t("cell.open", { person })}</Link>
        </p>
      </div>
    </details>
  );
}
