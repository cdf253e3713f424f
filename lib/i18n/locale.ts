import "server-only";
import { cookies, headers } from "next/headers";
import { isLocale, LANG_COOKIE, LOCALE_HEADER, type Locale } from "./config";
import { negotiateLocale } from "./negotiate";

/**
 * The language of this request: the signed-in person's stored choice (set by proxy.ts), else the
 * switch's cookie, else the browser's Accept-Language, else English.
 */
export async function requestLocale(): Promise<Locale> {
  const h = await headers();
  const fromAccount = h.get(LOCALE_HEADER);
  if (isLocale(fromAccount)) return fromAccount;
  const fromCookie = (await cookies()).get(LANG_COOKIE)?.value;
  if (isLocale(fromCookie)) return fromCookie;
  return negotiateLocale(h.get("accept-language"));
}
