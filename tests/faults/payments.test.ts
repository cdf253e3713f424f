// With the payment service down during checkout the manager gets a clear message, nothing is
// charged and no seats are added; the retry with the same key (the form keeps it) makes exactly one
// checkout, also when the service created it but its answer was lost on the way back.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { checkout, organization } from "@/db/schema";
import { FAKE, fakeSessions, newKey, pressOnPayPage, until } from "../helpers/billing";
import { freshIp, postJson, signIn, type Client } from "../helpers/http";
import { service } from "../helpers/services";
import { TEST_PASSWORD, createOrganization, createPeople } from "../helpers/fixtures";

const fake = (cmd: "start" | "stop") => service("payments-fake", cmd);
let client: Client;
let orgId: string;
const seats = async () => (await db.select({ seats: organization.seats }).from(organization).where(eq(organization.id, orgId)))[0]!.seats;

beforeAll(async () => {
  const org = await createOrganization("Payments Outage Fire Co", 5);
  orgId = org.id;
  const [m] = await createPeople(1, { organizationId: org.id, role: "manager", tag: "pay-outage" });
  client = await signIn(m!.email, TEST_PASSWORD, freshIp());
});
afterAll(async () => {
  await fake("start");
  await pool.end();
});

describe("payment service outage", () => {
  it("down during checkout: 503 with a clear message, nothing charged, no seats; the retry with the same key makes one checkout", async () => {
    const key = newKey();
    await fake("stop");
    const down = await postJson(client, "/api/billing/checkout", { seats: 3, idempotencyKey: key });
    expect(down.status).toBe(503);
    expect(down.json.error).toMatch(/payment service is not reachable/);
    expect(down.json.error).toMatch(/Nothing was charged and no seats were added/);
    expect(down.text).not.toMatch(/ECONNREFUSED|at .*\.js:\d+/);
    const [row] = await db.select().from(checkout).where(eq(checkout.organizationId, orgId));
    expect(row).toMatchObject({ status: "creating", providerSessionId: null });
    expect(await seats()).toBe(5);

    await fake("start");
    const up = await postJson(client, "/api/billing/checkout", { seats: 3, idempotencyKey: key });
    expect(up.status).toBe(201);
    expect(up.json.checkoutId).toBe(row!.id);
    const again = await postJson(client, "/api/billing/checkout", { seats: 3, idempotencyKey: key });
    expect(again.json).toMatchObject({ checkoutId: row!.id, url: up.json.url, reused: true });
    expect(await fakeSessions(row!.id)).toHaveLength(1);

    await pressOnPayPage(up.json.url as string, "pay");
    await until(async () => (await seats()) === 8);
  });

  it("the service creates the checkout but its answer is lost: the SDK's retry with the same idempotency key gets the same one", async () => {
    await fetch(`${FAKE}/_fake/faults`, { method: "POST", body: JSON.stringify({ dropResponses: 1 }) });
    const res = await postJson(client, "/api/billing/checkout", { seats: 2, idempotencyKey: newKey() });
    expect(res.status).toBe(201);
    expect(await fakeSessions(res.json.checkoutId as string)).toHaveLength(1);
    await pressOnPayPage(res.json.url as string, "pay");
    await until(async () => (await seats()) === 10);
    // paying the same checkout again is impossible: the page says it is paid
    const again = await pressOnPayPage(res.json.url as string, "pay").catch((e: Error) => e);
    expect(again).toBeInstanceOf(Error);
    expect(await seats()).toBe(10);
  });
});
