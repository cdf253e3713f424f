import "server-only";
import { and, desc, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { session } from "@/db/schema";

export type OwnSession = {
  id: string;
  current: boolean;
  createdAt: string;
  lastActiveAt: string;
  expiresAt: string;
  ipAddress: string | null;
  device: string;
};

/** A short, readable description of a user agent ("Chromium on Linux"); never the raw string's full detail. */
export function describeDevice(ua: string | null): string {
  if (!ua) return "Unknown device";
  const browser = /Edg\//.test(ua)
    ? "Edge"
    : /Firefox\//.test(ua)
      ? "Firefox"
      : /Chrom(e|ium)\//.test(ua)
        ? /HeadlessChrome|Chromium/.test(ua)
          ? "Chromium"
          : "Chrome"
        : /Safari\//.test(ua)
          ? "Safari"
          : /node|undici|curl/i.test(ua)
            ? "Script or app"
            : "Browser";
  const os = /Android/.test(ua) ? "Android" : /iPhone|iPad/.test(ua) ? "iOS" : /Windows/.test(ua) ? "Windows" : /Mac OS X/.test(ua) ? "macOS" : /Linux/.test(ua) ? "Linux" : null;
  return os ? `${browser} on ${os}` : browser;
}

/** The viewer's own live sessions (no tokens), the current one marked. Impersonation sessions are left out. */
export async function listOwnSessions(userId: string, currentSessionId: string): Promise<OwnSession[]> {
  const rows = await db
    .select({ id: session.id, createdAt: session.createdAt, updatedAt: session.updatedAt, expiresAt: session.expiresAt, ipAddress: session.ipAddress, userAgent: session.userAgent })
    .from(session)
    .where(and(eq(session.userId, userId), gt(session.expiresAt, new Date()), isNull(session.impersonatedBy)))
    .orderBy(desc(session.updatedAt));
  return rows
    .map((r) => ({
      id: r.id,
      current: r.id === currentSessionId,
      createdAt: r.createdAt.toISOString(),
      lastActiveAt: (r.updatedAt ?? r.createdAt).toISOString(),
      expiresAt: r.expiresAt.toISOString(),
      ipAddress: r.ipAddress,
      device: describeDevice(r.userAgent),
    }))
    .sort((a, b) => Number(b.current) - Number(a.current));
}
