// Content-Security-Policy with a per-request nonce on every page (MDN "Content-Security-Policy:
// script-src", nonce sources and 'strict-dynamic'; CSP Level 3 §6.7.2: a nonce is fresh for every
// response). No page may allow inline scripts by 'unsafe-inline', every <script> Next writes must
// carry that response's nonce (or the browser would refuse it and the page would not hydrate; the
// browser tests prove hydration), and two responses never share a nonce.
import { describe, expect, it } from "vitest";
import { demoByRole } from "@/db/demo";
import { anonymous, signIn, type Client } from "../helpers/http";

const scriptSrc = (csp: string) => csp.split(";").map((d) => d.trim()).find((d) => d.startsWith("script-src")) ?? "";

async function page(client: Client, path: string) {
  const res = await client.fetch(path);
  const html = await res.text();
  const csp = res.headers.get("content-security-policy") ?? "";
  const nonce = scriptSrc(csp).match(/'nonce-([A-Za-z0-9+/=]+)'/)?.[1] ?? null;
  return { status: res.status, csp, nonce, html };
}

function expectNonced(p: Awaited<ReturnType<typeof page>>, what: string) {
  expect(p.csp, `${what}: one policy, not two`).not.toContain(",");
  const src = scriptSrc(p.csp);
  expect(src, what).not.toContain("'unsafe-inline'");
  expect(src, what).not.toContain("'unsafe-eval'");
  expect(p.nonce, `${what}: script-src has a nonce`).toBeTruthy();
  expect(Buffer.from(p.nonce!, "base64").length, `${what}: 128-bit nonce`).toBeGreaterThanOrEqual(16);
  const scripts = [...p.html.matchAll(/<script\b([^>]*)>/g)].map((m) => m[1]!);
  expect(scripts.length, `${what}: Next's scripts are on the page`).toBeGreaterThan(0);
  for (const attrs of scripts) expect(attrs, `${what}: every script carries the nonce`).toContain(`nonce="${p.nonce}"`);
}

describe("script nonces on every page", () => {
  it("public pages (formerly prerendered) get a fresh nonce per request", async () => {
    const anon = anonymous();
    for (const path of ["/", "/sign-in", "/sign-up", "/forgot-password", "/verify", "/no-such-page"]) {
      const a = await page(anon, path);
      const b = await page(anon, path);
      expect([200, 404], path).toContain(a.status);
      expectNonced(a, `GET ${path}`);
      expectNonced(b, `GET ${path} again`);
      expect(a.nonce, `${path}: two requests, two nonces`).not.toBe(b.nonce);
    }
  });

  it("signed-in pages of learners, managers and admins", async () => {
    const cases: [string, string[]][] = [
      [demoByRole("learner").email, ["/learn", "/modules", "/modules/freeze-protection/where-homes-freeze", "/tools", "/account"]],
      [demoByRole("manager").email, ["/team", "/team/teams"]],
      [demoByRole("admin").email, ["/admin", "/admin/people"]],
    ];
    const seen = new Set<string>();
    for (const [email, paths] of cases) {
      const client = await signIn(email);
      for (const path of paths) {
        const p = await page(client, path);
        expect(p.status, path).toBe(200);
        expectNonced(p, `GET ${path}`);
        expect(seen.has(p.nonce!), `${path}: nonce not reused`).toBe(false);
        seen.add(p.nonce!);
      }
    }
  });

  it("JSON answers allow no inline script at all", async () => {
    const res = await anonymous().fetch("/api/health");
    const src = scriptSrc(res.headers.get("content-security-policy") ?? "");
    expect(src).toMatch(/^script-src 'self'/);
    expect(src).not.toContain("'unsafe-inline'");
  });
});
