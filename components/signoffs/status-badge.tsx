import { useTranslations } from "next-intl";
import type { SignOffStatus } from "@/db/schema";

/** A symbol beside the words, so the state never rests on colour alone (WCAG 1.4.1). */
const LOOK: Record<SignOffStatus | "none", { mark: string; cls: string }> = {
  none: { mark: "○", cls: "border-line bg-panel text-muted" },
  submitted: { mark: "◷", cls: "border-water bg-water-light text-water" },
  approved: { mark: "✓", cls: "border-pass bg-pass-light text-pass" },
  returned: { mark: "↩", cls: "border-caution bg-caution-light text-caution" },
};

/** The state of a sign-off in words, a symbol and colour (the words alone carry the meaning). */
export function SignOffBadge({ status }: { status: SignOffStatus | "none" }) {
  const t = useTranslations("signoffs");
  const look = LOOK[status];
  return (
    <span className={`inline-block rounded border px-2 py-0.5 text-sm font-bold whitespace-nowrap ${look.cls}`} data-status-pill>
      <span aria-hidden="true">{look.mark}</span> <span>{t(`status.${status}`)}</span>
    </span>
  );
}
