import type { SignOffStatus } from "@/db/schema";

const LOOK: Record<SignOffStatus | "none", { label: string; cls: string }> = {
  none: { label: "Not sent yet", cls: "border-line bg-panel text-muted" },
  submitted: { label: "Waiting for review", cls: "border-water bg-water-light text-water" },
  approved: { label: "✓ Signed off", cls: "border-pass bg-pass-light text-pass" },
  returned: { label: "Returned", cls: "border-caution bg-caution-light text-caution" },
};

/** The state of a sign-off in words and colour (the words alone carry the meaning). */
export function SignOffBadge({ status }: { status: SignOffStatus | "none" }) {
  const look = LOOK[status];
  return <span className={`inline-block rounded border px-2 py-0.5 text-sm font-bold whitespace-nowrap ${look.cls}`}>{look.label}</span>;
}
