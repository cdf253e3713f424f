/// <reference lib="webworker" />
// Riser's service worker, built with Serwist after `next build` (scripts/build-sw.mjs bundles this
// file with esbuild and injects the precache manifest of the build's static files).
//
// - The build's own scripts, styles and fonts (/_next/static) are precached, so a page kept on the
//   phone hydrates and its calculators run with no network.
// - Page loads go to the network first. With no network, a page the person kept on this phone
//   ("Keep on this phone" writes riser-saved-* caches from the page) is served from its cache; any
//   other page gets the offline page (kept with the modules, else precached), which says plainly
//   that it needs a connection.
// - When the server answers a kept page with a redirect (the session ended: signed out elsewhere,
//   banned, expired), every kept copy is deleted, so nothing personal stays readable.
// - Nothing else (API calls, quiz, certificates, uploads) is cached or answered by the worker.
import { CacheFirst, ExpirationPlugin, Serwist, type PrecacheEntry, type RouteHandlerCallbackOptions } from "serwist";
import { CACHE_PREFIX, OFFLINE_PAGE, OFFLINE_SHELL, SAVED_CACHE_PREFIX } from "../lib/offline/names";

declare const self: ServiceWorkerGlobalScope & { __SW_MANIFEST: (PrecacheEntry | string)[] };

/** How long a page load waits for a slow network before a kept copy is shown instead. */
const SLOW_NETWORK_MS = 6000;

async function keptCopy(request: Request): Promise<Response | undefined> {
  for (const name of await caches.keys()) {
    if (!name.startsWith(SAVED_CACHE_PREFIX)) continue;
    const hit = await (await caches.open(name)).match(request.url, { ignoreSearch: true, ignoreVary: true });
    if (hit) return hit;
  }
  return undefined;
}

async function deleteKeptCopies(): Promise<void> {
  const names = await caches.keys();
  await Promise.all(names.filter((n) => n.startsWith(SAVED_CACHE_PREFIX)).map((n) => caches.delete(n)));
}

function withTimeout<T>(p: Promise<T>, ms: number): Promise<T> {
  return new Promise((resolve, reject) => {
    const t = setTimeout(() => reject(new Error("slow network")), ms);
    p.then((v) => (clearTimeout(t), resolve(v)), (e) => (clearTimeout(t), reject(e)));
  });
}

async function pageLoad({ request }: RouteHandlerCallbackOptions): Promise<Response> {
  const kept = await keptCopy(request);
  try {
    const network = fetch(request);
    const res = kept ? await withTimeout(network, SLOW_NETWORK_MS) : await network;
    // A kept page answered with a redirect: the server no longer accepts this session.
    if (kept && res.type === "opaqueredirect") await deleteKeptCopies();
    return res;
  } catch {
    if (kept) return kept;
    // "needs a connection": the offline page kept with the reader's modules (in the reader's
    // language), else the one precached when this worker was installed
    return (await keptCopy(new Request(new URL(OFFLINE_PAGE, self.location.origin)))) ?? (await serwist.matchPrecache(OFFLINE_SHELL)) ?? Response.error();
  }
}

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  precacheOptions: { cleanupOutdatedCaches: true },
  cacheId: "riser",
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: false,
  runtimeCaching: [
    { matcher: ({ request }) => request.mode === "navigate", handler: pageLoad },
    {
      // Static files of a newer or older build than the precache (file names carry their hash).
      matcher: ({ url, sameOrigin }) => sameOrigin && url.pathname.startsWith("/_next/static/"),
      handler: new CacheFirst({ cacheName: `${CACHE_PREFIX}static`, plugins: [new ExpirationPlugin({ maxEntries: 200 })] }),
    },
  ],
});

// The page asks for this after sign-out as well as deleting the caches itself (belt and braces).
self.addEventListener("message", (event) => {
  if ((event.data as { type?: string } | null)?.type === "riser:forget") event.waitUntil(deleteKeptCopies());
});

serwist.addEventListeners();
