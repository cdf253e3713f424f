"use client";
import Link from "next/link";
import { useRouter, useSearchParams } from "next/navigation";
import { useTranslations } from "next-intl";
import { useEffect, useState } from "react";
import useSWR from "swr";
import { LiveMessage } from "@/components/ui/live-message";
import { useDebounced } from "@/components/ui/use-debounced";
import { getJson } from "@/lib/fetcher";
import type { SearchHit } from "@/lib/search/browser";


export function SearchBox() {
  const t = useTranslations("search");
  const params = useSearchParams();
  const router = useRouter();
  const [q, setQ] = useState(params.get("q") ?? "");
  const debounced = useDebounced(q.trim(), 150);
  const { data, error, isLoading } = useSWR<{ hits: SearchHit[]; didYouMean?: string | null }>(debounced ? `/api/search?q=${encodeURIComponent(debounced)}&limit=20` : null, getJson, { keepPreviousData: true });

  useEffect(() => {
    router.replace(debounced ? `/search?q=${encodeURIComponent(debounced)}` : "/search", { scroll: false });
  }, [debounced, router]);

  const noResults = t("noResults", { q: debounced });
  return (
    <div className="flex flex-col gap-4">
      <form role="search" onSubmit={(e) => e.preventDefault()} className="flex flex-col gap-1">
        <label htmlFor="q" className="font-bold">{t("label")}</label>
        <input
          id="q"
          type="search"
          value={q}
          onChange={(e) => setQ(e.target.value)}
          maxLength={500}
          autoComplete="off"
          placeholder={t("placeholder")}
          className="min-h-11 rounded border border-ink/40 bg-panel px-3 py-2"
        />
      </form>
      <LiveMessage message={!debounced || !data || isLoading ? "" : data.hits.length === 0 ? noResults : t("results", { count: data.hits.length })} testId="search-announcement" />
      <div aria-busy={isLoading}>
        {!debounced ? <p className="text-muted">{t("typeToSearch")}</p> : null}
        {error ? <p role="alert" className="text-caution">{t("unavailable", { message: error.message })}</p> : null}
        {debounced && isLoading && !data ? <p className="text-muted">{t("searching")}</p> : null}
        {debounced && data?.didYouMean && data.didYouMean !== debounced.toLowerCase() ? (
          <p className="mb-2" data-testid="did-you-mean">
            {t.rich("didYouMean", {
              word: data.didYouMean,
              button: (c) => (
                <button type="button" className="font-bold text-water underline" onClick={() => setQ(data.didYouMean!)}>
                  {c}
                </button>
              ),
            })}
          </p>
        ) : null}
        {debounced && data && data.hits.length === 0 ? <p>{noResults}</p> : null}
        {debounced && data && data.hits.length > 0 ? (
          <>
            <ol className="flex flex-col gap-3">
              {data.hits.map((h) => (
                <li key={h.id} className="rounded border border-line bg-panel p-3">
                  <p className="font-mono text-xs uppercase text-muted">
                    {t(`kind.${h.kind}`)} · {h.context}
                  </p>
                  <Link href={h.href} className="text-lg font-bold">{h.title}</Link>
                  <p className="mt-1 text-sm">
                    {h.snippet.map((s, i) => (s.hit ? <mark key={i} className="bg-copper-light px-0.5 text-ink">{s.text}</mark> : <span key={i}>{s.text}</span>))}
                  </p>
                </li>
              ))}
            </ol>
          </>
        ) : null}
      </div>
    </div>
  );
}
