// While the database is down, the proxy answers 503 itself; those answers carry the same security
// headers as every other response (MDN "Content-Security-Policy"; OWASP Secure Headers Project).
import { afterAll, describe, expect, it } from "vitest";
import { APP } from "../helpers/http";
import { service } from "../helpers/services";

const db = (cmd: "start" | "stop") => service("db", cmd);

describe("security headers on the proxy's 503 answers", () => {
  afterAll(async () => {
    await db("start");
    for (let i = 0; i < 80; i++) {
      if ((await fetch(`${APP}/api/health`)).status === 200) return;
      await new Promise((r) => setTimeout(r, 250));
    }
  });

  it("pages and API routes", async () => {
    await db("stop");
    await new Promise((r) => setTimeout(r, 1200)); // the proxy remembers its probe for 1 s
    for (const path of ["/learn", "/admin/people", "/api/admin/people", "/api/account/records"]) {
      const res = await fetch(`${APP}${path}`, { redirect: "manual" });
      expect(res.status, path).toBe(503);
      const csp = res.headers.get("content-security-policy") ?? "";
      expect(csp, path).toMatch(/frame-ancestors 'none'/);
      expect(csp, path).not.toContain("unsafe-eval");
      expect(res.headers.get("x-content-type-options"), path).toBe("nosniff");
      expect(res.headers.get("referrer-policy"), path).toBe("strict-origin-when-cross-origin");
    }
  });
});
