import { useTranslations } from "next-intl";

const kinds = {
  caution: { box: "border-caution bg-caution-light", title: "text-caution", icon: "!" },
  tip: { box: "border-water bg-water-light", title: "text-water", icon: "i" },
  code: { box: "border-copper bg-copper-light", title: "text-copper", icon: "§" },
} as const;

/**
 * The heading of a callout: the kind's label, then the title without a repeat of that label
 * ("Code note" + "Code note: listed for sprinkler use" → "Code note: listed for sprinkler use").
 */
export function calloutHeading(label: string, title?: string): string {
  const rest = (title ?? "").trim();
  const prefix = new RegExp(`^${label.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}\\s*[:—–-]\\s*`, "i");
  const clean = rest.replace(prefix, "").trim();
  return clean ? `${label}: ${clean}` : label;
}

export function Callout({ type = "tip", title, children }: { type?: keyof typeof kinds; title?: string; children: React.ReactNode }) {
  const t = useTranslations("lesson");
  const kind = type in kinds ? type : "tip";
  const k = kinds[kind];
  const label = t(`callout.${kind}`);
  return (
    <aside className={`my-5 rounded border-l-4 p-4 ${k.box}`} aria-label={calloutHeading(label, title)} data-callout={type}>
      <p className={`flex items-center gap-2 font-bold ${k.title}`}>
        <span aria-hidden="true" className="inline-flex h-6 w-6 items-center justify-center rounded-full border-2 border-current font-mono text-sm">
          {k.icon}
        </span>
        <span>{calloutHeading(label, title)}</span>
      </p>
      <div className="mt-2 [&>p:first-child]:mt-0">{children}</div>
    </aside>
  );
}
