/**
 * Public addresses of the portable credentials, all derived from APP_URL (pure: no server code).
 * They are part of every credential handed out, so they must never change for a running instance.
 */
export const VC_CONTEXT_V2 = "https://www.w3.org/ns/credentials/v2";
/** The Open Badges 3.0 JSON-LD context (the published file is in ../shared/standards/openbadges-3.0/) */
export const OB_CONTEXT = "https://purl.imsglobal.org/spec/ob/v3p0/context-3.0.3.json";

/** W3C Bitstring Status List v1.0 §2.1: at least 131 072 entries (16 KB) per list, for group privacy. */
export const STATUS_LIST_SIZE = 131_072;

const trim = (appUrl: string) => appUrl.replace(/\/+$/, "");

/**
 * did:web of this instance (W3C CCG did:web method §3.2: the host, a port's colon percent-encoded
 * as %3A, path segments joined with ":"). A root-hosted instance serves its document at
 * /.well-known/did.json.
 */
export function didWebOf(appUrl: string): string {
  const u = new URL(appUrl);
  const segments = u.pathname.split("/").filter(Boolean).map(encodeURIComponent);
  return ["did:web", u.host.replace(":", "%3A"), ...segments].join(":");
}

export const issuerUrl = (appUrl: string) => `${trim(appUrl)}/api/credentials/issuer`;
export const jwksUrl = (appUrl: string) => `${trim(appUrl)}/.well-known/jwks.json`;
export const statusListUrl = (appUrl: string, list: number) => `${trim(appUrl)}/api/credentials/status/${list}`;
export const achievementUrl = (appUrl: string, kind: "module" | "path", slug: string) => `${trim(appUrl)}/api/credentials/achievements/${kind}/${slug}`;
/** The credential of one certificate, reached with its verification code (what the holder shares). */
export const credentialUrl = (appUrl: string, code: string, format: "json" | "jwt" = "json") =>
  `${trim(appUrl)}/api/verify/${encodeURIComponent(code)}/credential${format === "jwt" ? "?format=jwt" : ""}`;

/** Position (the entry's id, from 1) → list number (from 1) and index inside that list. */
export function statusSlot(position: number): { list: number; index: number } {
  if (!Number.isInteger(position) || position < 1) throw new RangeError(`bad status position ${position}`);
  return { list: Math.floor((position - 1) / STATUS_LIST_SIZE) + 1, index: (position - 1) % STATUS_LIST_SIZE };
}

/** The positions (ids) a list covers: first..last inclusive. */
export function listRange(list: number): { first: number; last: number } {
  return { first: (list - 1) * STATUS_LIST_SIZE + 1, last: list * STATUS_LIST_SIZE };
}
