import { useTranslations } from "next-intl";
import Image from "next/image";
import { evidenceUrl, type EvidenceItem } from "@/lib/signoffs";
import { formatBytes } from "@/lib/signoffs/browser";

/**
 * Thumbnails of a submission's files, each opening the full file in a new tab. Every URL goes
 * through the checking route (never straight to the store), so the browser's own session decides.
 */
export function EvidenceThumbs({ signOffId, items }: { signOffId: string; items: EvidenceItem[] }) {
  const t = useTranslations("signoffs");
  if (!items.length) return <p className="text-sm text-muted">{t("noFiles")}</p>;
  return (
    <ul className="flex flex-wrap gap-3" aria-label={t("filesLabel")}>
      {items.map((e, i) => (
        <li key={e.id} className="w-40">
          <a href={evidenceUrl(signOffId, e.id)} target="_blank" rel="noopener" className="block rounded border border-line bg-panel p-1 no-underline">
            {e.thumbnail ? (
              <Image
                src={evidenceUrl(signOffId, e.id, true)}
                alt={t("photoAlt", { n: i + 1, total: items.length, name: e.name })}
                width={152}
                height={114}
                unoptimized
                className="h-[114px] w-[152px] rounded-sm bg-paper object-cover"
              />
            ) : (
              <span className="flex h-[114px] w-[152px] flex-col items-center justify-center rounded-sm bg-paper text-center font-bold text-ink">
                <span aria-hidden="true" className="text-2xl">📄</span>
                PDF
              </span>
            )}
            <span className="mt-1 block text-sm break-all text-water underline">{e.name}</span>
            <span className="block font-mono text-xs text-muted">{formatBytes(e.size)}</span>
          </a>
        </li>
      ))}
    </ul>
  );
}
