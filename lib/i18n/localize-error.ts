import "server-only";
import { createTranslator } from "use-intl/core";
import { INTL_TAG, type Locale } from "./config";
import { errorKeyOf } from "./error-text";
import { requestLocale } from "./locale";
import { loadMessages } from "./messages";

/** One English API message in `locale` (unchanged when it is not in messages/<locale>/errors.json). */
export function localizeError(text: string, locale: Locale): string {
  if (locale === "en") return text;
  const found = errorKeyOf(text);
  if (!found) return text;
  const t = createTranslator({ locale: INTL_TAG[locale], messages: loadMessages(locale), namespace: "errors" });
  return t(found.key as never, found.values as never);
}

// Riser's own answers carry `error`; better-auth's carry `message` (with a `code`)
type Body = { error?: unknown; message?: unknown; fieldErrors?: Record<string, unknown> };

/**
 * A route handler whose 4xx answers (`{ error, fieldErrors }`) speak the request's language: the
 * signed-in person's, else the switch's cookie, else Accept-Language (lib/i18n/locale.ts). Other
 * answers pass through untouched.
 */
export function inRequestLanguage<A extends unknown[]>(handler: (req: Request, ...rest: A) => Promise<Response>) {
  return async (req: Request, ...rest: A): Promise<Response> => {
    const res = await handler(req, ...rest);
    if (res.status < 400 || res.status >= 500 || !(res.headers.get("content-type") ?? "").includes("json")) return res;
    const locale = await requestLocale();
    if (locale === "en") return res;
    const body = (await res.clone().json().catch(() => null)) as Body | null;
    if (!body || typeof body !== "object") return res;
    const out: Body = { ...body };
    if (typeof body.error === "string") out.error = localizeError(body.error, locale);
    if (typeof body.message === "string") out.message = localizeError(body.message, locale);
    if (body.fieldErrors && typeof body.fieldErrors === "object") {
      out.fieldErrors = Object.fromEntries(
        Object.entries(body.fieldErrors).map(([k, v]) => [k, Array.isArray(v) ? v.map((m) => (typeof m === "string" ? localizeError(m, locale) : m)) : v]),
      );
    }
    const headers = new Headers(res.headers);
    headers.delete("content-length");
    headers.set("Content-Language", INTL_TAG[locale]);
    return new Response(JSON.stringify(out), { status: res.status, headers });
  };
}
