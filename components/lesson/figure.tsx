import { useTranslations } from "next-intl";

export function Figure({ caption, children }: { caption: string; children: React.ReactNode }) {
  return (
    <figure className="my-6 rounded border border-line bg-panel p-3">
      <div className="overflow-x-auto [&_svg]:mx-auto [&_svg]:h-auto [&_svg]:w-full [&_svg]:max-w-2xl">{children}</div>
      <figcaption className="mt-2 text-sm text-muted">{caption}</figcaption>
    </figure>
  );
}

export function WorkedExample({ title, children }: { title: string; children: React.ReactNode }) {
  const t = useTranslations("lesson");
  return (
    <section className="my-6 rounded border border-ink/30 bg-panel p-4" aria-label={t("workedExampleOf", { title })}>
      <p className="font-mono text-xs uppercase tracking-wide text-copper">{t("workedExample")}</p>
      <h3 className="mt-1 text-lg">{title}</h3>
      <div className="mt-2">{children}</div>
    </section>
  );
}
