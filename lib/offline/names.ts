/**
 * Names shared by the service worker (sw/riser-sw.ts) and the pages: where saved modules live in
 * Cache Storage, and the one page served when a page that needs a connection is opened offline.
 * Plain constants, no browser or server APIs, so both bundles can import them.
 */

/** Every cache Riser itself creates starts with this (sign-out deletes the saved-page ones). */
export const CACHE_PREFIX = "riser-";
/** One cache per saved module and content version: `riser-saved-<module>@<version>`. */
export const SAVED_CACHE_PREFIX = `${CACHE_PREFIX}saved-`;
export const savedCacheName = (module: string, version: string) => `${SAVED_CACHE_PREFIX}${module}@${version}`;
/**
 * Served for any page opened offline that is not kept on the phone: the copy kept with the reader's
 * modules (in the reader's language), else the precached one.
 */
export const OFFLINE_PAGE = "/offline";
/**
 * The address the service worker precaches the offline page under (scripts/build-sw.mjs writes the
 * same string). Not /offline itself: the precache answers its own addresses before any other route,
 * and the page must come from the network while there is one (it is rendered in the reader's language).
 */
export const OFFLINE_SHELL = `${OFFLINE_PAGE}?shell=1`;
/** The service worker's own address (a route handler serves the file built with the app). */
export const SERVICE_WORKER_URL = "/sw.js";
