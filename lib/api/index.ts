import "server-only";
import { ZodError, type ZodType } from "zod";
import { AccessError, check, getRequestViewer, type Rule, type Viewer } from "@/lib/access";
import { isDatabaseDown } from "@/lib/db-errors";
import { DomainError } from "@/lib/errors";
import { env } from "@/lib/env";
import { clientIpOf } from "@/lib/client-ip";
import { addLogBindings, log, withLogContext } from "@/lib/log";
import { observeRequest, routePattern } from "@/lib/metrics";
import { REQUEST_ID_HEADER } from "@/lib/request-id";

/** An error whose message is safe to show: becomes `{ error }` with its status. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fieldErrors?: Record<string, string[]>,
  ) {
    super(message);
  }
}

export function json(body: unknown, init?: number | ResponseInit): Response {
  const opts = typeof init === "number" ? { status: init } : init;
  return Response.json(body, { ...opts, headers: { "Cache-Control": "no-store", ...(opts?.headers ?? {}) } });
}

export function fieldErrorsOf(error: ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

/**
 * Parses a JSON body with a schema. Only a body declared application/json is read (415 otherwise):
 * another site's page can send text/plain or a form without asking, but not JSON. A body that is not
 * JSON or does not fit → 400 with field errors.
 */
export async function readJson<T>(req: Request, schema: ZodType<T>): Promise<T> {
  const type = (req.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
  if (type !== "application/json") throw new ApiError(415, "Send the request body as JSON (Content-Type: application/json).");
  let raw: unknown;
  try {
    raw = await req.json();
  } catch {
    throw new ApiError(400, "The request body must be JSON.");
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw new ApiError(400, "Some fields need attention.", fieldErrorsOf(parsed.error));
  return parsed.data;
}

type Ctx<P> = { req: Request; viewer: Viewer | null; params: P };
type SignedCtx<P> = { req: Request; viewer: Viewer; params: P };

/** Maps any thrown error to a real status with a message; never a stack trace. */
export function errorResponse(err: unknown): Response {
  if (err instanceof ApiError || err instanceof DomainError) {
    const details = err instanceof DomainError ? err.details : undefined;
    const retry = details?.retryAfterSeconds;
    return json(
      { ...details, error: err.message, ...(err.fieldErrors ? { fieldErrors: err.fieldErrors } : {}) },
      { status: err.status, ...(retry !== undefined ? { headers: { "Retry-After": String(retry) } } : {}) },
    );
  }
  if (err instanceof AccessError) return json({ error: err.message, ...(err.code ? { code: err.code } : {}) }, err.status);
  if (err instanceof ZodError) return json({ error: "Some fields need attention.", fieldErrors: fieldErrorsOf(err) }, 400);
  if (isDatabaseDown(err)) {
    return json({ error: "Riser's database is not reachable right now. Try again in a minute." }, { status: 503, headers: { "Retry-After": "10" } });
  }
  log().error({ err }, "unexpected error in a route handler");
  return json({ error: "Something went wrong on our side. Nothing was saved." }, 500);
}

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Changes come only from Riser's own pages: a state-changing request whose Origin is another site,
 * or whose Sec-Fetch-Site says cross-site or same-site, is refused with 403 (on top of the SameSite
 * session cookie). Clients that send neither header are not browsers and carry no one else's cookie.
 */
export function assertSameOrigin(req: Request): void {
  if (SAFE_METHODS.has(req.method.toUpperCase())) return;
  const origin = req.headers.get("origin");
  const site = req.headers.get("sec-fetch-site");
  const own = new URL(env.APP_URL).origin;
  if (origin !== null ? origin !== own : site !== null && site !== "same-origin" && site !== "none") {
    throw new ApiError(403, "This change must come from Riser's own pages. Reload the page and try again.");
  }
}

/**
 * The one wrapper for route handlers: refuses changes sent from another site (403), checks the
 * access rule (401/403), then runs the handler and maps errors. Route params arrive awaited.
 * Runs inside a log context (the request id proxy.ts set, then the person's and organization's
 * ids), writes one log line per request and counts it in the metrics by route pattern.
 */
export function route<P = Record<string, string>>(rule: "public", fn: (ctx: Ctx<P>) => Promise<Response>): (req: Request, ctx: { params: Promise<P> }) => Promise<Response>;
export function route<P = Record<string, string>>(rule: Exclude<Rule, "public">, fn: (ctx: SignedCtx<P>) => Promise<Response>): (req: Request, ctx: { params: Promise<P> }) => Promise<Response>;
export function route<P>(rule: Rule, fn: (ctx: never) => Promise<Response>) {
  return async (req: Request, ctx: { params: Promise<P> }) => {
    const started = performance.now();
    // proxy.ts always sets this header (overwriting any client value); a new id if it did not run
    const requestId = req.headers.get(REQUEST_ID_HEADER) ?? crypto.randomUUID();
    return withLogContext({ requestId }, async () => {
      let params: P | undefined;
      let res: Response;
      try {
        params = ctx?.params ? await ctx.params : ({} as P);
        assertSameOrigin(req);
        const viewer = check(await getRequestViewer(req), rule);
        if (viewer) addLogBindings({ personId: viewer.id, organizationId: viewer.organizationId });
        res = await (fn as (c: Ctx<P>) => Promise<Response>)({ req, viewer, params });
      } catch (err) {
        res = errorResponse(err);
      }
      const seconds = (performance.now() - started) / 1000;
      const { pathname } = new URL(req.url);
      const pattern = routePattern(pathname, params as Record<string, unknown> | undefined);
      observeRequest(pattern, req.method, res.status, seconds);
      log()[res.status >= 500 ? "error" : "info"]({ method: req.method, route: pattern, status: res.status, ms: Math.round(seconds * 1000) }, "request");
      if (!res.headers.has(REQUEST_ID_HEADER)) {
        try {
          res.headers.set(REQUEST_ID_HEADER, requestId);
        } catch {
          // immutable headers (a Response passed through): the proxy already set it
        }
      }
      return res;
    });
  };
}

/**
 * The client address for audit rows and rate limits: the connected peer (appended by
 * scripts/serve.mjs), or with TRUSTED_PROXY_HOPS set, the address the first trusted proxy saw.
 * A forged X-Forwarded-For never decides it (lib/client-ip).
 */
export function clientIp(req: Request): string {
  return clientIpOf(req.headers);
}
