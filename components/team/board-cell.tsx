"use client";
import Link from "next/link";
import type { RichCell } from "@/lib/team";
import { STATUS_LABELS } from "@/lib/team/browser";
import { plural } from "@/lib/plural";
import { StatusBadge } from "./status-badge";

const shortDate = (iso: string) => new Intl.DateTimeFormat("en-US", { month: "short", day: "numeric", year: "numeric", timeZone: "UTC" }).format(new Date(iso));

/**
 * One board cell: the status badge, what needs the manager ("waiting for your review"), the due or
 * end date; its details open on tap or Enter (a disclosure, not a hover-only tooltip).
 */
export function BoardCellView({ cell, person, module, personId }: { cell: RichCell; person: string; module: string; personId: string }) {
  const done = cell.status === "passed" || cell.status === "expiring";
  return (
    <details className="group relative" data-testid="board-cell">
      <summary className="flex cursor-pointer list-none flex-col items-start gap-0.5 rounded p-0.5 focus-visible:outline focus-visible:outline-2" aria-label={`${person}, ${module}: ${STATUS_LABELS[cell.status]}${cell.waitingSignOffs ? ", sign-off waiting for your review" : ""}${cell.refresherDue ? ", refresher due" : ""}. Show details`}>
        <StatusBadge status={cell.status} compact />
        {cell.waitingSignOffs ? <span className="whitespace-nowrap text-xs font-bold text-copper">waiting for your review</span> : null}
        {cell.refresherDue ? <span className="whitespace-nowrap text-xs font-bold text-copper" data-testid="refresher-due">refresher due</span> : null}
        {!done && cell.dueAt ? <span className="whitespace-nowrap text-xs text-muted">due {shortDate(cell.dueAt)}</span> : null}
        {(cell.status === "expiring" || cell.status === "expired") && cell.expiresAt ? (
          <span className="whitespace-nowrap text-xs text-muted">{cell.status === "expired" ? "ended" : "ends"} {shortDate(cell.expiresAt)}</span>
        ) : null}
      </summary>
      <div className="absolute left-0 top-full z-20 mt-1 w-64 rounded border border-line bg-panel p-3 text-xs shadow-lg">
        <p className="font-bold">{module}</p>
        <ul className="mt-1 flex flex-col gap-0.5">
          <li>{cell.lessonsDone} of {plural(cell.lessonsTotal, "lesson")} done</li>
          <li>{plural(cell.attempts, "quiz attempt")}{cell.bestScore !== null ? ` · best ${cell.bestScore}%` : ""}</li>
          {cell.completedAt ? <li>Completed {shortDate(cell.completedAt)}</li> : null}
          {cell.serial ? <li>Certificate <span className="font-mono">{cell.serial}</span></li> : null}
          {cell.dueAt ? <li>Due {shortDate(cell.dueAt)}</li> : null}
          {cell.expiresAt ? <li>Valid until {shortDate(cell.expiresAt)}</li> : null}
        </ul>
        <p className="mt-2 flex flex-wrap gap-3">
          {cell.waitingSignOffs ? <Link href="/team/sign-offs" className="inline-flex min-h-6 items-center">Review the sign-off</Link> : null}
          <Link href={`/team/people/${personId}`} className="inline-flex min-h-6 items-center">Open {person}</Link>
        </p>
      </div>
    </details>
  );
}
