// Readiness tells a stopped database from a stopped object store, while liveness and metrics keep
// answering (they need neither); both come back by themselves once the service returns.
import { afterAll, describe, expect, it } from "vitest";
import { APP } from "../helpers/http";
import { service } from "../helpers/services";

const auth = { authorization: `Bearer ${process.env.METRICS_SECRET}` };
const ready = async () => {
  const res = await fetch(`${APP}/api/health/ready`, { headers: auth });
  return { status: res.status, body: (await res.json()) as { status: string; database: { ok: boolean; error?: string }; objectStore: { ok: boolean; error?: string } } };
};

async function until(fn: () => Promise<boolean>, ms = 20_000) {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    if (await fn().catch(() => false)) return true;
    await new Promise((r) => setTimeout(r, 250));
  }
  return false;
}

describe("readiness during outages", () => {
  afterAll(async () => {
    await service("s3-fake", "start");
    await service("db", "start");
  }, 120_000);

  it("reports a stopped object store as not ready, the database still up", async () => {
    expect((await ready()).status).toBe(200);
    await service("s3-fake", "stop");
    const r = await ready();
    expect(r.status).toBe(503);
    expect(r.body.status).toBe("not ready");
    expect(r.body.objectStore.ok).toBe(false);
    expect(r.body.objectStore.error).toMatch(/object store/);
    expect(r.body.database.ok).toBe(true);
    expect((await fetch(`${APP}/api/health/live`)).status).toBe(200);
    expect((await fetch(`${APP}/api/health/ready`)).status).toBe(401); // still no details without the secret
    await service("s3-fake", "start");
    expect(await until(async () => (await ready()).status === 200)).toBe(true);
  });

  it("reports a stopped database as not ready; liveness and metrics keep answering", async () => {
    await service("db", "stop");
    const r = await ready();
    expect(r.status).toBe(503);
    expect(r.body.database.ok).toBe(false);
    expect(r.body.database.error).not.toMatch(/riser:|password|mysql:\/\//i);
    expect((await fetch(`${APP}/api/health/live`)).status).toBe(200);
    expect((await fetch(`${APP}/api/metrics`, { headers: auth })).status).toBe(200);
    expect((await fetch(`${APP}/api/metrics`)).status).toBe(401);
    await service("db", "start");
    expect(await until(async () => (await ready()).status === 200)).toBe(true);
  });
});
