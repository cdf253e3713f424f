// Security headers of every response: pages, route handlers, and the proxy's own answers (503,
// redirects). Plain JavaScript so that next.config.mjs and proxy.ts share the one list.

/**
 * Content-Security-Policy. Next's hydration uses inline scripts, hence 'unsafe-inline' for scripts;
 * 'unsafe-eval' only in development (React's dev tools and fast refresh need it), never in production.
 * @param {boolean} production
 */
export function contentSecurityPolicy(production) {
  return [
    "default-src 'self'",
    `script-src 'self' 'unsafe-inline'${production ? "" : " 'unsafe-eval'"}`,
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

/**
 * @param {boolean} production
 * @returns {{ key: string, value: string }[]}
 */
export function securityHeaders(production) {
  return [
    { key: "Content-Security-Policy", value: contentSecurityPolicy(production) },
    { key: "X-Content-Type-Options", value: "nosniff" },
    { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
    { key: "X-Frame-Options", value: "DENY" },
    { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
    { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
  ];
}

/**
 * Sets the headers on a response the proxy builds itself.
 * @param {Headers} headers
 * @param {boolean} production
 */
export function applySecurityHeaders(headers, production) {
  for (const h of securityHeaders(production)) headers.set(h.key, h.value);
  return headers;
}
