// With the test database stopped the app answers 503 (page and JSON, no stack trace) and recovers
// by itself once it is back.
import { afterAll, describe, expect, it } from "vitest";
import { APP } from "../helpers/http";
import { service } from "../helpers/services";

const db = (cmd: "start" | "stop") => service("db", cmd);

async function until(fn: () => Promise<boolean>, ms = 20_000) {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    if (await fn()) return true;
    await new Promise((r) => setTimeout(r, 250));
  }
  return false;
}

describe("database outage", () => {
  afterAll(() => db("start"), 120_000);

  it("health is 200 while the database runs", async () => {
    const res = await fetch(`${APP}/api/health`);
    expect(res.status).toBe(200);
    expect((await res.json()).database).toBe("up");
  });

  it("gives 503 with a clear message while it is stopped, then recovers", async () => {
    await db("stop");
    await new Promise((r) => setTimeout(r, 1200)); // the proxy's probe is remembered for 1 s
    const health = await fetch(`${APP}/api/health`);
    expect(health.status).toBe(503);
    expect((await health.json()).database).toBe("down");

    const page = await fetch(`${APP}/learn`, { redirect: "manual" });
    expect(page.status).toBe(503);
    const html = await page.text();
    expect(html).toContain("briefly unavailable");
    expect(html).not.toMatch(/at .*\.js:\d+/);

    const api = await fetch(`${APP}/api/account/sign-up`, { method: "POST", body: "{}", headers: { "content-type": "application/json", origin: APP } });
    expect(api.status).toBe(503);
    expect((await api.json()).error).toMatch(/database/);

    await db("start");
    const back = await until(async () => (await fetch(`${APP}/api/health`)).status === 200);
    expect(back).toBe(true);
  });
});
