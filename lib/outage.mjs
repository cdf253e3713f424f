// What a request gets when a service Riser depends on is down: 503 with a clear message, as a page
// or as JSON, never a 500. Plain JavaScript, no Node imports, so that proxy.ts (new requests while
// its database probe fails), scripts/serve.mjs (requests already past the proxy when the service
// dropped) and the app's own code share one answer and one way to report an outage:
//
// scripts/serve.mjs runs every request inside an AsyncLocalStorage kept on globalThis under
// OUTAGE_SLOT. Code that sees a failure caused by an outage (instrumentation.ts onRequestError for
// page renders, lib/auth for better-auth's own endpoints) calls noteOutage(service); if that
// request's answer then starts with a 5xx, serve.mjs sends this 503 answer instead.

export const OUTAGE_SLOT = Symbol.for("riser.request-outage");

/** @typedef {"database" | "object store"} OutageService */

/** Marks the current request as failed because `service` is down (no-op outside scripts/serve.mjs). */
export function noteOutage(/** @type {OutageService} */ service) {
  const store = /** @type {{ getStore(): { service?: OutageService } | undefined } | undefined} */ (globalThis[OUTAGE_SLOT])?.getStore();
  if (store && !store.service) store.service = service;
}

/** The JSON `error` text (route handlers use the same words). */
export function outageMessage(/** @type {OutageService} */ service) {
  return service === "object store" ? "The file store is not reachable right now. Try again in a minute." : "Riser's database is not reachable right now. Try again in a minute.";
}

/**
 * A page of its own (the app's layout — and its message catalogs — may be what cannot load), plain
 * styles, no script, in English and Spanish on one page (each part marked with its language).
 */
export function outagePage(/** @type {OutageService} */ service) {
  const what = service === "object store" ? "Our file store is" : "Our database is";
  const que = service === "object store" ? "El almacén de archivos no responde" : "La base de datos no responde";
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>Riser is briefly unavailable · Riser no está disponible por un momento</title></head>
<body style="font-family:system-ui,sans-serif;background:#F7F4EE;color:#14202B;max-width:40rem;margin:3rem auto;padding:0 1rem">
<h1>Riser is briefly unavailable</h1><p>${what} not answering right now. Nothing you saved is lost. This page will work again as soon as it is back &mdash; try again in a minute.</p>
<div lang="es"><h2>Riser no está disponible por un momento</h2><p>${que} en este momento. No se perdió nada de lo que guardaste. Esta página volverá a funcionar en cuanto regrese &mdash; inténtalo de nuevo en un minuto.</p></div></body></html>`;
}

/** Seconds a client should wait before trying again (Retry-After). */
export const OUTAGE_RETRY_AFTER_S = 10;
