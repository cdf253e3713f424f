import { STATUS_LABELS, type BoardStatus } from "@/lib/team/browser";

/** Colour and a symbol, never colour alone; the words carry the meaning for screen readers. */
const STYLE: Record<BoardStatus, { cls: string; mark: string; short: string }> = {
  not_started: { cls: "border-line bg-panel text-muted", mark: "○", short: "Not started" },
  in_progress: { cls: "border-water/40 bg-water-light text-water", mark: "◐", short: "In progress" },
  passed: { cls: "border-pass/40 bg-pass-light text-pass", mark: "✓", short: "Passed" },
  failed: { cls: "border-caution/40 bg-caution-light text-caution", mark: "✗", short: "Failed" },
  expiring: { cls: "border-copper/40 bg-copper-light text-copper", mark: "◔", short: "Expiring" },
  expired: { cls: "border-caution/40 bg-caution-light text-caution", mark: "!", short: "Expired" },
  overdue: { cls: "border-caution bg-caution text-white", mark: "!", short: "Overdue" },
};

export function StatusBadge({ status, compact = false }: { status: BoardStatus; compact?: boolean }) {
  const s = STYLE[status];
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-1.5 py-0.5 text-xs font-bold ${s.cls}`} title={STATUS_LABELS[status]} data-status-pill>
      <span aria-hidden="true">{s.mark}</span>
      {compact ? (
        <>
          <span aria-hidden="true">{s.short}</span>
          <span className="sr-only">{STATUS_LABELS[status]}</span>
        </>
      ) : (
        STATUS_LABELS[status]
      )}
    </span>
  );
}
