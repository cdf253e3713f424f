import { useTranslations } from "next-intl";
import type { CertificateStatus } from "@/lib/certificates/browser";

const STYLE: Record<CertificateStatus, string> = {
  valid: "border-pass bg-pass-light text-pass",
  expired: "border-muted bg-paper text-muted",
  revoked: "border-caution bg-caution-light text-caution",
};
const MARK: Record<CertificateStatus, string> = { valid: "✓", expired: "○", revoked: "✕" };

/** Status in words and colour (never colour alone). */
export function StatusBadge({ status, expiringSoon, size = "sm" }: { status: CertificateStatus; expiringSoon?: boolean; size?: "sm" | "lg" }) {
  const t = useTranslations("certificates");
  const cls = status === "valid" && expiringSoon ? "border-caution bg-caution-light text-caution" : STYLE[status];
  const text = status === "valid" && expiringSoon ? t("expiringSoon") : t(`status.${status}`);
  return (
    <span
      className={`inline-flex items-center gap-1 rounded border font-bold ${size === "lg" ? "px-3 py-1 text-xl" : "px-2 py-0.5 text-sm"} ${cls}`}
      data-testid="certificate-status"
      data-status-pill
    >
      <span aria-hidden="true">{MARK[status]}</span>
      {text}
    </span>
  );
}
