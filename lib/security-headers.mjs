// Security headers of every response: pages, route handlers, and the proxy's own answers (503,
// redirects). Plain JavaScript so that next.config.mjs and proxy.ts share the one list.

/**
 * Content-Security-Policy. Scripts: no 'unsafe-inline'. HTML pages get a fresh nonce per request from
 * proxy.ts (Next reads it from the request's CSP header and puts it on its own inline and bundle
 * scripts; 'strict-dynamic' lets those load the chunks they import). Every other response (JSON,
 * files, the proxy's 503 page) runs no inline script and gets the policy without a nonce.
 * Styles keep 'unsafe-inline': React `style` attributes (charts, progress bars, Next's route
 * announcer) cannot carry a nonce, and a nonce in style-src would make browsers ignore
 * 'unsafe-inline'. Style injection cannot run code; scripts stay locked down.
 * 'unsafe-eval' only in development (React's dev tools and fast refresh need it), never in production.
 * @param {boolean} production
 * @param {string} [nonce] base64, fresh for every request
 */
export function contentSecurityPolicy(production, nonce) {
  const scripts = nonce ? `'self' 'nonce-${nonce}' 'strict-dynamic'` : "'self'";
  return [
    "default-src 'self'",
    `script-src ${scripts}${production ? "" : " 'unsafe-eval'"}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    // The service worker (/sw.js) and the web app manifest load from this origin only.
    "worker-src 'self'",
    "manifest-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** A fresh nonce: 128 random bits, base64 (CSP Level 3 asks for at least 128 bits). */
export function newNonce() {
  return btoa(String.fromCharCode(...crypto.getRandomValues(new Uint8Array(16))));
}

/**
 * @param {boolean} production
 * @returns {{ key: string, value: string }[]}
 */
export function securityHeaders(production) {
  return [
    { key: "Content-Security-Policy", value: contentSecurityPolicy(production) },
    ...otherSecurityHeaders,
  ];
}

/** Everything but the CSP (next.config.mjs sends these; proxy.ts sends the CSP with its nonce). */
export const otherSecurityHeaders = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
];

/**
 * Sets the headers on a response the proxy builds itself.
 * @param {Headers} headers
 * @param {boolean} production
 */
export function applySecurityHeaders(headers, production) {
  for (const h of securityHeaders(production)) headers.set(h.key, h.value);
  return headers;
}
