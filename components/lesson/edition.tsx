import { useTranslations } from "next-intl";
import { Children, isValidElement, type ReactNode } from "react";
import { editionLabel, editionsOf, type EditionSpec } from "@/lib/content/browser";

/**
 * The passages' labels in the reader's language. Pages pass their catalog's version
 * (components/lesson/lesson-text.ts); without one the labels are English.
 */
export type EditionText = {
  label: (editions: readonly number[]) => string;
  notStated: string;
  other: (label: string) => string;
  yours: (label: string) => string;
};
export const ENGLISH_EDITION_TEXT: EditionText = {
  label: (editions) => `NFPA 13D ${editionLabel(editions as Parameters<typeof editionLabel>[0])}`,
  notStated: "NFPA 13D (editions not stated)",
  other: (label) => `Other edition: ${label}`,
  yours: (label) => `${label}: your adopted edition`,
};

/**
 * Edition-aware passages. <Edition only="2013 2016">…</Edition> (or from="2019" / to="2016") marks
 * text that holds only in those NFPA 13D editions. The reader's organization's default edition
 * (`current`) decides: its passage shows open and labelled; passages for other editions sit one
 * click away in a labelled <details>. Without a default every passage shows, each labelled.
 * <Editions> around several passages puts the one for the current edition first.
 */
type Props = EditionSpec & { children?: ReactNode };

function applies(spec: EditionSpec, current: number | null): boolean {
  const r = editionsOf(spec);
  return "editions" in r && current !== null && (r.editions as number[]).includes(current);
}

export function editionComponents(current: number | null, text: EditionText = ENGLISH_EDITION_TEXT) {
  function Edition({ children, ...spec }: Props) {
    const r = editionsOf(spec);
    const label = "editions" in r ? text.label(r.editions) : text.notStated;
    const mine = applies(spec, current);
    if (current !== null && !mine) {
      return (
        <details className="my-4 rounded border border-line bg-panel px-4 py-2" data-edition={label} data-current="false">
          <summary className="min-h-11 cursor-pointer py-2 font-bold text-muted">{text.other(label)}</summary>
          <div className="mt-2 [&>p:first-child]:mt-0">{children}</div>
        </details>
      );
    }
    return (
      <section className="my-4 rounded border-l-4 border-water bg-water-light px-4 py-3" aria-label={label} data-edition={label} data-current={mine ? "true" : "none-set"}>
        <p className="text-sm font-bold text-water">{mine ? text.yours(label) : label}</p>
        <div className="mt-2 [&>p:first-child]:mt-0">{children}</div>
      </section>
    );
  }
  function Editions({ children }: { children?: ReactNode }) {
    const items = Children.toArray(children);
    const isMine = (c: ReactNode) => isValidElement<Props>(c) && applies(c.props, current);
    return <div data-editions="">{[...items.filter(isMine), ...items.filter((c) => !isMine(c))]}</div>;
  }
  return { Edition, Editions };
}

/** The organization's local rules on the page's topics: clearly marked, with who wrote each and when. */
export function LocalRules({ rules }: { rules: { topic: string; label: string; body: string; authorName: string; date: string }[] }) {
  const t = useTranslations("lesson");
  if (rules.length === 0) return null;
  return (
    <>
      {rules.map((r) => (
        <aside key={r.topic} className="max-w-prose rounded border-l-4 border-copper bg-copper-light p-4" aria-label={t("localRule", { label: r.label })} data-testid="local-rule">
          <p className="font-bold text-copper">{t("localRule", { label: r.label })}</p>
          <p className="mt-1 whitespace-pre-line">{r.body}</p>
          <p className="mt-1 text-sm text-muted">
            {t("localRuleBy", { name: r.authorName, date: r.date })}
          </p>
        </aside>
      ))}
    </>
  );
}
