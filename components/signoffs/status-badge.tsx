import type { SignOffStatus } from "@/db/schema";

/** A symbol beside the words, so the state never rests on colour alone (WCAG 1.4.1). */
const LOOK: Record<SignOffStatus | "none", { label: string; mark: string; cls: string }> = {
  none: { label: "Not sent yet", mark: "○", cls: "border-line bg-panel text-muted" },
  submitted: { label: "Waiting for review", mark: "◷", cls: "border-water bg-water-light text-water" },
  approved: { label: "Signed off", mark: "✓", cls: "border-pass bg-pass-light text-pass" },
  returned: { label: "Returned", mark: "↩", cls: "border-caution bg-caution-light text-caution" },
};

/** The state of a sign-off in words, a symbol and colour (the words alone carry the meaning). */
export function SignOffBadge({ status }: { status: SignOffStatus | "none" }) {
  const look = LOOK[status];
  return (
    <span className={`inline-block rounded border px-2 py-0.5 text-sm font-bold whitespace-nowrap ${look.cls}`} data-status-pill>
      <span aria-hidden="true">{look.mark}</span> <span>{look.label}</span>
    </span>
  );
}
