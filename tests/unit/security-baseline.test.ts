// Security baseline, checked on the real objects the app uses (the runtime check of real HTTP
// responses is tests/integration/security-headers.test.ts). References: MDN "Content-Security-Policy"
// (frame-ancestors, unsafe-eval), OWASP Secure Headers Project (nosniff, Referrer-Policy), RFC 6265bis
// (Secure, HttpOnly, SameSite cookies; the "__Secure-" name prefix).
import { afterEach, describe, expect, it, vi } from "vitest";
import { NextRequest } from "next/server";
import { contentSecurityPolicy, newNonce, securityHeaders } from "@/lib/security-headers.mjs";

const BASE_ENV = {
  DATABASE_URL: "mysql://riser:x@127.0.0.1:1/riser", // port 1: nothing listens, so the database is "down"
  BETTER_AUTH_SECRET: "unit-test-secret-0123456789abcdef0123",
  SMTP_URL: "smtp://127.0.0.1:1",
  APP_URL: "https://riser.example.test",
};

afterEach(() => {
  vi.unstubAllEnvs();
  vi.resetModules();
});

describe("content security policy", () => {
  it("has no unsafe-eval in production, and forbids framing", () => {
    const prod = contentSecurityPolicy(true);
    expect(prod).not.toContain("unsafe-eval");
    expect(prod).toMatch(/frame-ancestors 'none'/);
    expect(prod).toMatch(/object-src 'none'/);
    expect(prod).toMatch(/default-src 'self'/);
    // development keeps unsafe-eval for React's dev tooling only
    expect(contentSecurityPolicy(false)).toContain("'unsafe-eval'");
  });

  it("allows no inline script by 'unsafe-inline': pages by a nonce, everything else none", () => {
    const scriptSrc = (csp: string) => csp.split("; ").find((d) => d.startsWith("script-src"))!;
    const nonce = newNonce();
    expect(Buffer.from(nonce, "base64").length).toBe(16); // 128 bits (CSP Level 3 §6.7.2 asks for at least 128)
    expect(newNonce()).not.toBe(nonce);
    for (const production of [true, false]) {
      expect(scriptSrc(contentSecurityPolicy(production, nonce))).toContain(`'nonce-${nonce}' 'strict-dynamic'`);
      expect(scriptSrc(contentSecurityPolicy(production, nonce))).not.toContain("'unsafe-inline'");
      expect(scriptSrc(contentSecurityPolicy(production))).not.toContain("'unsafe-inline'");
    }
  });

  it("lists nosniff, a referrer policy and frame denial", () => {
    const h = Object.fromEntries(securityHeaders(true).map((x) => [x.key.toLowerCase(), x.value]));
    expect(h["x-content-type-options"]).toBe("nosniff");
    expect(h["referrer-policy"]).toBe("strict-origin-when-cross-origin");
    expect(h["x-frame-options"]).toBe("DENY");
  });
});

describe("the proxy's own 503 answers carry the security headers", () => {
  it("for pages and API routes while the database is unreachable", async () => {
    for (const [k, v] of Object.entries(BASE_ENV)) vi.stubEnv(k, v);
    vi.stubEnv("NODE_ENV", "production");
    const { proxy } = await import("@/proxy");
    for (const url of ["http://127.0.0.1:3999/learn", "http://127.0.0.1:3999/api/search?q=x"]) {
      const res = await proxy(new NextRequest(url));
      expect(res.status).toBe(503);
      expect(res.headers.get("content-security-policy")).toMatch(/frame-ancestors 'none'/);
      expect(res.headers.get("content-security-policy")).not.toContain("unsafe-eval");
      expect(res.headers.get("x-content-type-options")).toBe("nosniff");
      expect(res.headers.get("referrer-policy")).toBeTruthy();
      expect(res.headers.get("retry-after")).toBe("10");
    }
  });
});

describe("session cookie attributes (better-auth configuration of lib/auth)", () => {
  async function sessionCookie(insecure: "0" | "1") {
    for (const [k, v] of Object.entries(BASE_ENV)) vi.stubEnv(k, v);
    // the test run's local-profile settings are refused on a public APP_URL (lib/env-local.ts): a hosted
    // instance has none of them; insecure cookies exist only on a local instance (loopback + RISER_LOCAL=1)
    for (const k of ["MAIL_CATCHER_URL", "STRIPE_API_HOST", "STRIPE_API_PORT", "STRIPE_API_PROTOCOL", "RISER_LOCAL"]) vi.stubEnv(k, undefined);
    if (insecure === "1") {
      vi.stubEnv("APP_URL", "http://127.0.0.1:3999");
      vi.stubEnv("RISER_LOCAL", "1");
    }
    vi.stubEnv("INSECURE_COOKIES", insecure);
    const { auth } = await import("@/lib/auth");
    const ctx = await auth.$context;
    return ctx.authCookies.sessionToken;
  }

  it("is Secure (with the __Secure- prefix), HttpOnly and SameSite=Lax by default", async () => {
    const c = await sessionCookie("0");
    expect(c.name.startsWith("__Secure-")).toBe(true);
    expect(c.attributes).toMatchObject({ secure: true, httpOnly: true, sameSite: "lax" });
  });

  it("drops only Secure when INSECURE_COOKIES=1 (plain http on loopback)", async () => {
    const c = await sessionCookie("1");
    expect(c.name.startsWith("__Secure-")).toBe(false);
    expect(c.attributes).toMatchObject({ secure: false, httpOnly: true, sameSite: "lax" });
  });
});
