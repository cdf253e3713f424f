import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { user } from "@/db/schema";
import { forgetCachedSessions } from "@/lib/auth";
import { env } from "@/lib/env";
import { LANG_COOKIE, type Locale } from "@/lib/i18n/browser";

/** Stores a signed-in person's language (pages, e-mails, certificates follow it). */
export async function saveLanguage(userId: string, locale: Locale): Promise<void> {
  await db.update(user).set({ language: locale }).where(eq(user.id, userId));
  // the signed session copy carries the language: refuse older copies here, so the next page follows
  forgetCachedSessions(userId);
}

/** The language switch's cookie: one year, readable by the server only, Secure outside local profiles. */
export function languageCookie(locale: Locale): string {
  const secure = env.INSECURE_COOKIES === "1" ? "" : "; Secure";
  return `${LANG_COOKIE}=${locale}; Path=/; Max-Age=${60 * 60 * 24 * 365}; HttpOnly; SameSite=Lax${secure}`;
}
