import { useTranslations } from "next-intl";
import type { BoardStatus } from "@/lib/team/browser";

/** Colour and a symbol, never colour alone; the words carry the meaning for screen readers. */
const STYLE: Record<BoardStatus, { cls: string; mark: string }> = {
  not_started: { cls: "border-line bg-panel text-muted", mark: "○" },
  in_progress: { cls: "border-water/40 bg-water-light text-water", mark: "◐" },
  passed: { cls: "border-pass/40 bg-pass-light text-pass", mark: "✓" },
  failed: { cls: "border-caution/40 bg-caution-light text-caution", mark: "✗" },
  expiring: { cls: "border-copper/40 bg-copper-light text-copper", mark: "◔" },
  expired: { cls: "border-caution/40 bg-caution-light text-caution", mark: "!" },
  overdue: { cls: "border-caution bg-caution text-white", mark: "!" },
};

export function StatusBadge({ status, compact = false }: { status: BoardStatus; compact?: boolean }) {
  const t = useTranslations("team");
  const s = STYLE[status];
  const full = t(`status.${status}`);
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-1.5 py-0.5 text-xs font-bold ${s.cls}`} title={full} data-status-pill>
      <span aria-hidden="true">{s.mark}</span>
      {compact ? (
        <>
          <span aria-hidden="true">{t(`statusShort.${status}`)}</span>
          <span className="sr-only">{full}</span>
        </>
      ) : (
        full
      )}
    </span>
  );
}
