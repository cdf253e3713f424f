import "server-only";
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import type { Locale } from "./config";

/**
 * The message catalogs: messages/<locale>/<namespace>.json, one file per area of the product, read
 * once per process. Keys are ICU messages (next-intl); tests/unit/i18n-catalogs.test.ts keeps the two
 * languages' keys and placeholders identical.
 */
export type Messages = Record<string, Record<string, unknown>>;
const cache = new Map<Locale, Messages>();

export const messagesDir = () => path.join(process.cwd(), "messages");

export function loadMessages(locale: Locale): Messages {
  const hit = cache.get(locale);
  if (hit) return hit;
  const dir = path.join(messagesDir(), locale);
  const out: Messages = {};
  for (const f of readdirSync(dir).filter((n) => n.endsWith(".json")).sort()) {
    out[f.slice(0, -".json".length)] = JSON.parse(readFileSync(path.join(dir, f), "utf8"));
  }
  cache.set(locale, out);
  return out;
}
