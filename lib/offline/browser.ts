// The offline area's browser face: keeping modules on the phone (Cache Storage), the queue of marks
// made with no connection (IndexedDB through idb-keyval), and forgetting both at sign-out.
// Pure page-side code: the service worker (sw/riser-sw.ts) only reads the caches written here.
import { clear, createStore, del, entries, get, set, type UseStore } from "idb-keyval";
import { postJson } from "@/lib/fetcher";
import { SAVED_CACHE_PREFIX, SERVICE_WORKER_URL, savedCacheName } from "./names";

export * from "./names";

/** `locale`: the language the pages were stored in (the reader's, when they were kept). */
export type SavedModule = { module: string; locale?: string; title: string; version: string; savedAt: string; bytes: number; pages: number; cache: string };
/** `title`: module and lesson titles as the learner read them (marks queued before it was kept have none) */
export type QueuedMark = { module: string; lesson: string; title?: string; readingSeconds: number; markedAt: string; note?: string };
type Plan = { module: string; locale: string; title: string; version: string; urls: string[] };

/**
 * Why keeping a module failed, as a code the page words through its message catalog (offline.errors.*);
 * `detail` is the server's own (already translated) refusal or the address that could not be stored.
 */
export class KeepError extends Error {
  constructor(
    readonly code: "planFailed" | "sessionEnded" | "notStored" | "connectionDropped",
    readonly detail: { message?: string; url?: string; status?: number } = {},
  ) {
    super(code);
  }
}

/** Fired on window whenever what is kept or queued changes, so lists re-read it. */
export const OFFLINE_CHANGED = "riser:offline-changed";
const changed = () => window.dispatchEvent(new Event(OFFLINE_CHANGED));

let store: UseStore | null = null;
const db = () => (store ??= createStore("riser-offline", "kv"));

export const offlineSupported = () => typeof window !== "undefined" && "caches" in window && "indexedDB" in window && "serviceWorker" in navigator;

/** Registers the service worker (production builds only: next dev has none). */
export async function registerServiceWorker(): Promise<void> {
  if (!offlineSupported() || process.env.NODE_ENV !== "production") return;
  await navigator.serviceWorker.register(SERVICE_WORKER_URL, { scope: "/" }).catch(() => undefined);
}

/** Who the server says is signed in on this phone now (null offline or signed out). */
export async function signedInUserId(): Promise<string | null> {
  const res = await fetch("/api/auth/get-session", { cache: "no-store", credentials: "same-origin" }).catch(() => null);
  if (!res?.ok) return null;
  const body = (await res.json().catch(() => null)) as { user?: { id?: string } } | null;
  return body?.user?.id ?? null;
}

/** Forgets everything when someone else signs in on this phone (kept pages and queue are personal). */
export async function claimFor(userId: string): Promise<void> {
  const owner = await get<string>("owner", db());
  if (owner && owner !== userId) await forgetEverything();
  if (owner !== userId) await set("owner", userId, db());
}

// ---- connection -------------------------------------------------------------------------------
// navigator.onLine alone is not trusted: a phone on a dead Wi-Fi or one bar says "online". The
// connection counts as there when Riser itself answers (a small static file, never cached).

let reachable = typeof navigator === "undefined" ? true : navigator.onLine;
const listeners = new Set<() => void>();

function setReachable(value: boolean) {
  if (value === reachable) return;
  reachable = value;
  for (const l of listeners) l();
}

export const isReachable = () => reachable;

/** Asks Riser itself whether it can be reached (5 s at most); updates everyone listening. */
export async function checkConnection(): Promise<boolean> {
  const ctl = new AbortController();
  const timer = setTimeout(() => ctl.abort(), 5000);
  try {
    const res = await fetch("/manifest.webmanifest", { method: "HEAD", cache: "no-store", signal: ctl.signal });
    setReachable(res.status < 500 || res.status === 503);
  } catch {
    setReachable(false);
  } finally {
    clearTimeout(timer);
  }
  return reachable;
}

/** For useSyncExternalStore: browser online/offline events, then Riser's own answer. */
export function subscribeConnection(onChange: () => void): () => void {
  listeners.add(onChange);
  const online = () => void checkConnection();
  const offline = () => setReachable(false);
  window.addEventListener("online", online);
  window.addEventListener("offline", offline);
  return () => {
    listeners.delete(onChange);
    window.removeEventListener("online", online);
    window.removeEventListener("offline", offline);
  };
}

// ---- kept modules ---------------------------------------------------------------------------

/**
 * Counts sign-outs in this page: a module still being kept when one happens stores nothing (its
 * pages and record would otherwise land after forgetEverything's clear and stay for the next person).
 */
let forgetRound = 0;

export async function listSaved(): Promise<SavedModule[]> {
  const all = await entries<string, SavedModule>(db());
  return all.filter(([k]) => k.startsWith("saved:")).map(([, v]) => v).sort((a, b) => a.title.localeCompare(b.title));
}

export async function savedModule(module: string): Promise<SavedModule | undefined> {
  return get<SavedModule>(`saved:${module}`, db());
}

/**
 * Stores a module's pages in a new cache named after its content version, records it, then drops
 * any older copy. A failure part-way leaves the previous copy as it was.
 */
export async function keepModule(module: string): Promise<SavedModule> {
  const started = forgetRound;
  const res = await fetch(`/api/offline/modules/${encodeURIComponent(module)}`, { credentials: "same-origin" });
  const planBody = (await res.json().catch(() => ({}))) as Plan & { error?: string };
  if (!res.ok) throw new KeepError("planFailed", { message: planBody.error, status: res.status });
  if (navigator.serviceWorker) await navigator.serviceWorker.ready;
  const name = savedCacheName(planBody.module, planBody.version);
  const cache = await caches.open(name);
  let bytes = 0;
  const store = async (url: string) => {
    const page = await fetch(url, { credentials: "same-origin", redirect: "manual" });
    if (page.type === "opaqueredirect") throw new KeepError("sessionEnded");
    if (!page.ok || page.type !== "basic") throw new KeepError("notStored", { url, status: page.status });
    bytes += (await page.clone().arrayBuffer()).byteLength;
    await cache.put(url, page);
  };
  try {
    // A few pages at a time: quicker on a weak signal, gentle on the server.
    const queue = [...planBody.urls];
    await Promise.all(Array.from({ length: 3 }, async () => {
      for (let url = queue.shift(); url; url = queue.shift()) await store(url);
    }));
  } catch (err) {
    const previous = await savedModule(planBody.module);
    if (previous?.cache !== name) await caches.delete(name);
    throw err instanceof TypeError ? new KeepError("connectionDropped") : err;
  }
  // Signed out while the pages were on their way: keep nothing for the next person on this phone.
  if (forgetRound !== started) {
    await caches.delete(name);
    throw new KeepError("sessionEnded");
  }
  const saved: SavedModule = { module: planBody.module, locale: planBody.locale, title: planBody.title, version: planBody.version, savedAt: new Date().toISOString(), bytes, pages: planBody.urls.length, cache: name };
  // no await between the check above and this write: a later sign-out's clear() runs after it
  await set(`saved:${planBody.module}`, saved, db());
  for (const old of await caches.keys()) if (old.startsWith(`${SAVED_CACHE_PREFIX}${planBody.module}@`) && old !== name) await caches.delete(old);
  changed();
  return saved;
}

export async function removeModule(module: string): Promise<void> {
  const saved = await savedModule(module);
  if (saved) await caches.delete(saved.cache);
  for (const name of await caches.keys()) if (name.startsWith(`${SAVED_CACHE_PREFIX}${module}@`)) await caches.delete(name);
  await del(`saved:${module}`, db());
  changed();
}

/** Online: replaces every kept module whose content version changed since it was stored. */
export async function refreshStale(): Promise<string[]> {
  const saved = await listSaved();
  if (!saved.length) return [];
  const res = await fetch("/api/offline/versions", { credentials: "same-origin" }).catch(() => null);
  if (!res?.ok) return [];
  const { modules } = (await res.json()) as { modules: Record<string, string> };
  const replaced: string[] = [];
  for (const s of saved) {
    const current = modules[s.module];
    if (current === undefined) await removeModule(s.module);
    else if (current !== s.version && (await keepModule(s.module).catch(() => null))) replaced.push(s.module);
  }
  return replaced;
}

// ---- marks made offline ---------------------------------------------------------------------

export async function listQueue(): Promise<QueuedMark[]> {
  const all = await entries<string, QueuedMark>(db());
  return all.filter(([k]) => k.startsWith("queue:")).map(([, v]) => v).sort((a, b) => a.markedAt.localeCompare(b.markedAt));
}

/** One entry per lesson: marking twice keeps the first mark and the longer reading time. */
export async function queueMark(module: string, lesson: string, readingSeconds: number, title?: string): Promise<void> {
  const key = `queue:${module}/${lesson}`;
  const prev = await get<QueuedMark>(key, db());
  const seconds = Math.max(0, Math.round(readingSeconds), prev?.readingSeconds ?? 0);
  await set(key, { module, lesson, title: title ?? prev?.title, readingSeconds: seconds, markedAt: prev?.markedAt ?? new Date().toISOString() }, db());
  changed();
}

/**
 * Sends every queued mark. Sent (or already done) → removed; the server's seat-time rule not met
 * yet (409) or no connection → kept, with the server's words as a note; refused for good (the
 * lesson no longer exists, 400/404) → removed. The progress API is idempotent, so a repeat is harmless.
 */
export async function flushQueue(): Promise<{ sent: number; waiting: number }> {
  let sent = 0;
  let waiting = 0;
  for (const item of await listQueue()) {
    const key = `queue:${item.module}/${item.lesson}`;
    const res = await postJson("/api/progress", { module: item.module, lesson: item.lesson, offline: { readingSeconds: item.readingSeconds, markedAt: item.markedAt } });
    setReachable(res.ok || res.status !== 0);
    if (res.ok) {
      await del(key, db());
      sent++;
    } else if (res.status === 400 || res.status === 404) {
      await del(key, db());
    } else {
      await set(key, { ...item, note: res.status === 0 ? undefined : res.error }, db());
      waiting++;
    }
  }
  if (sent || waiting) changed();
  return { sent, waiting };
}

// ---- sign-out ---------------------------------------------------------------------------------

/** Deletes every kept page and every queued mark on this phone, and tells the worker to do the same. */
export async function forgetEverything(): Promise<void> {
  if (!offlineSupported()) return;
  forgetRound++;
  const names = await caches.keys();
  await Promise.all(names.filter((n) => n.startsWith(SAVED_CACHE_PREFIX)).map((n) => caches.delete(n)));
  await clear(db());
  navigator.serviceWorker.controller?.postMessage({ type: "riser:forget" });
  changed();
}
