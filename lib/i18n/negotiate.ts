import { DEFAULT_LOCALE, LOCALES, type Locale } from "./config";

/**
 * The best of Riser's languages for an Accept-Language header (RFC 9110 §12.5.4): ranges sorted by
 * their q-value, a primary-tag match counts ("es-MX" picks "es"), q=0 means "not this one".
 */
export function negotiateLocale(acceptLanguage: string | null | undefined): Locale {
  if (!acceptLanguage) return DEFAULT_LOCALE;
  const ranges = acceptLanguage
    .split(",")
    .slice(0, 20)
    .map((part, i) => {
      const [tag = "", ...params] = part.trim().split(";");
      const q = params.map((p) => p.trim()).find((p) => p.startsWith("q="));
      const quality = q ? Number(q.slice(2)) : 1;
      return { tag: tag.trim().toLowerCase(), q: Number.isFinite(quality) ? quality : 0, i };
    })
    .filter((r) => r.tag && r.q > 0)
    .sort((a, b) => b.q - a.q || a.i - b.i);
  for (const r of ranges) {
    if (r.tag === "*") return DEFAULT_LOCALE;
    const primary = r.tag.split("-")[0];
    const hit = LOCALES.find((l) => l === primary);
    if (hit) return hit;
  }
  return DEFAULT_LOCALE;
}
