import "server-only";
import { z } from "zod";
import { env } from "@/lib/env";
import { LANG_COOKIE, LOCALES, type Locale } from "./config";

export const languageChoice = z.object({ language: z.enum(LOCALES, { message: "Choose English or Español." }) });

/** The switch's cookie: one year, readable by the server only, Secure outside local profiles. */
export function languageCookie(locale: Locale): string {
  const secure = env.INSECURE_COOKIES === "1" ? "" : "; Secure";
  return `${LANG_COOKIE}=${locale}; Path=/; Max-Age=${60 * 60 * 24 * 365}; HttpOnly; SameSite=Lax${secure}`;
}
