// Seat purchases over the real route handlers, MariaDB and the local payments fake: seats change
// only on a verified, signed webhook, exactly once per payment, whatever order or how often the
// provider's events arrive. The provider's behaviour the fake imitates (idempotency keys, signed
// events, "checkout.session.*" event types) follows its API and webhook docs (from memory — verify).
import { randomUUID } from "node:crypto";
import { and, eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { auditLog, checkout, invitation, organization, paymentEvent, user } from "@/db/schema";
import { demoByRole } from "@/db/demo";
import { CURRENCY, PLANS, TRIAL } from "@/lib/billing/plans";
import { formatMoney, quote } from "@/lib/billing/pricing";
import { errorResponse } from "@/lib/api";
import { assertSeatAvailable, BILLING_PATH, SeatLimitError } from "@/lib/billing/seats";
import { FAKE, fakeEvents, fakeSessions, newKey, postWebhook, pressOnPayPage, sessionEvent, until } from "../helpers/billing";
import { anonymous, freshIp, mailsTo, postJson, signIn, uniqueEmail, waitForMail, type Client } from "../helpers/http";
import { TEST_PASSWORD, createOrganization, createPeople } from "../helpers/fixtures";

const maren = demoByRole("manager", "quillmoor");
let manager: Client;
let learner: Client;
let otherManager: Client;
let admin: Client;
let quillmoorId: string;

async function seatsOf(orgId: string): Promise<number> {
  const [o] = await db.select({ seats: organization.seats }).from(organization).where(eq(organization.id, orgId));
  return o!.seats;
}
async function totalSeats(): Promise<number> {
  const [r] = await db.select({ n: sql<string>`SUM(${organization.seats})` }).from(organization);
  return Number(r!.n);
}
async function eventRows(providerEventId: string) {
  return db.select().from(paymentEvent).where(eq(paymentEvent.providerEventId, providerEventId));
}
async function checkoutRow(id: string) {
  const [c] = await db.select().from(checkout).where(eq(checkout.id, id));
  return c!;
}
const buy = (client: Client, seats: number, idempotencyKey = newKey(), extra: Record<string, unknown> = {}) =>
  postJson(client, "/api/billing/checkout", { seats, idempotencyKey, ...extra });

/** A test organization with its own manager (so that these tests do not depend on demo seats). */
async function testOrg(tag: string, seats: number, trialEndsAt: Date | null = null) {
  const org = await createOrganization(`Billing ${tag} Fire Co`, seats);
  if (trialEndsAt) await db.update(organization).set({ trialEndsAt }).where(eq(organization.id, org.id));
  const [m] = await createPeople(1, { organizationId: org.id, role: "manager", tag: `bill-${tag}` });
  return { ...org, manager: m!, client: await signIn(m!.email, TEST_PASSWORD, freshIp()) };
}

beforeAll(async () => {
  manager = await signIn(maren.email);
  learner = await signIn(demoByRole("learner", "quillmoor").email);
  otherManager = await signIn(demoByRole("manager", "larkhaven").email);
  admin = await signIn(demoByRole("admin").email);
  const [q] = await db.select({ id: organization.id }).from(organization).where(eq(organization.name, "Quillmoor Fire Protection"));
  quillmoorId = q!.id;
});
afterAll(() => pool.end());

describe("checkout → fake payment → signed webhook → seats", () => {
  let checkoutId: string;
  let sessionId: string;
  let seatsBefore: number;
  const key = newKey();
  const q = quote(4, PLANS, CURRENCY)!;

  it("the demo manager starts a checkout; nothing is added before the payment", async () => {
    seatsBefore = await seatsOf(quillmoorId);
    const res = await buy(manager, 4, key);
    expect(res.status).toBe(201);
    checkoutId = res.json.checkoutId as string;
    expect(res.json.url).toMatch(new RegExp(`^${FAKE}/pay/cs_test_`));
    expect(res.json).toMatchObject({ seats: 4, amount: q.amount, currency: CURRENCY });
    expect(await seatsOf(quillmoorId)).toBe(seatsBefore);
    expect((await checkoutRow(checkoutId)).status).toBe("open");

    // what the provider received: 4 seats at the plan's price, tied to our checkout and organization
    const [s, ...more] = await fakeSessions(checkoutId);
    expect(more).toHaveLength(0);
    sessionId = s!.id;
    expect(s).toMatchObject({ amount_total: q.amount, currency: CURRENCY, status: "open", payment_status: "unpaid" });
    expect(s!.metadata).toMatchObject({ organizationId: quillmoorId, checkoutId, seats: "4" });
  });

  it("sending the same request again (double click, retry) returns the same checkout, not a second one", async () => {
    const again = await buy(manager, 4, key);
    expect(again.status).toBe(200);
    expect(again.json).toMatchObject({ checkoutId, reused: true });
    expect(await fakeSessions(checkoutId)).toHaveLength(1);
    const differentCount = await buy(manager, 6, key);
    expect(differentCount.status).toBe(409);
    expect(differentCount.json.error).toMatch(/started for 4 seats/);
  });

  it("the fake's page shows the price; Pay sends the signed webhook and the seats arrive once", async () => {
    const page = await (await fetch(`${FAKE}/pay/${sessionId}`)).text();
    expect(page).toContain(formatMoney(q.amount, CURRENCY));
    const res = await pressOnPayPage(`${FAKE}/pay/${sessionId}`, "pay");
    expect(res.status).toBe(303);
    expect(res.headers.get("location")).toBe(`${process.env.APP_URL}/team/billing/success?checkout=${checkoutId}`);

    await until(async () => (await seatsOf(quillmoorId)) === seatsBefore + 4);
    const c = await checkoutRow(checkoutId);
    expect(c.status).toBe("paid");
    const [evt] = await fakeEvents(sessionId);
    expect(evt!.type).toBe("checkout.session.completed");
    const [row] = await eventRows(evt!.id);
    expect(row).toMatchObject({ outcome: "seats_added", seatsAdded: 4, seatsBefore, seatsAfter: seatsBefore + 4, amount: q.amount, currency: CURRENCY, organizationId: quillmoorId });

    const audited = await db.select().from(auditLog).where(and(eq(auditLog.action, "billing.seats_purchased"), eq(auditLog.targetId, checkoutId)));
    expect(audited).toHaveLength(1);
    expect(audited[0]!.actorEmail).toBe(maren.email);

    const mail = await waitForMail(maren.email, /Riser receipt: 4 seats for Quillmoor Fire Protection/);
    expect(mail.text).toContain(formatMoney(q.amount, CURRENCY));
    expect(mail.text).toContain(`Seats now:     ${seatsBefore + 4} (before: ${seatsBefore})`);
    expect(mail.text).toMatch(/Receipt:\s+R-\d{6}/);
  });

  it("the billing API lists the receipt; the checkout reads as paid; a retry of the paid purchase is refused", async () => {
    const overview = await manager.fetch("/api/billing");
    expect(overview.status).toBe(200);
    const o = (await overview.json()).organization;
    expect(o.seats).toBe(seatsBefore + 4);
    expect(o.receipts[0]).toMatchObject({ seatsAdded: 4, seatsBefore, seatsAfter: seatsBefore + 4, amount: q.amount, reference: sessionId, boughtBy: maren.name });
    const status = await (await manager.fetch(`/api/billing/checkout/${checkoutId}`)).json();
    expect(status).toMatchObject({ status: "paid", seatsNow: seatsBefore + 4 });
    const retry = await buy(manager, 4, key);
    expect(retry.status).toBe(409);
    expect(await seatsOf(quillmoorId)).toBe(seatsBefore + 4);
  });

  it("the provider resending the same event adds nothing", async () => {
    const [evt] = await fakeEvents(sessionId);
    const resent = await (await fetch(`${FAKE}/_fake/events/${evt!.id}/resend`, { method: "POST" })).json();
    expect(resent.status).toBe(200);
    const direct = await postWebhook(evt!.payload); // the same event, signed afresh
    expect(direct).toMatchObject({ status: 200, json: { outcome: "duplicate", seatsAdded: 0 } });
    expect(await eventRows(evt!.id)).toHaveLength(1);
    expect(await seatsOf(quillmoorId)).toBe(seatsBefore + 4);
    expect((await mailsTo(maren.email)).filter((m) => /Riser receipt: 4 seats/.test(m.subject))).toHaveLength(1);
  });

  it("the same event delivered twice at the same moment adds the seats once", async () => {
    const t = await testOrg("race", 5);
    const res = await buy(t.client, 3);
    const [s] = await fakeSessions(res.json.checkoutId as string);
    const evt = sessionEvent("checkout.session.completed", { ...s, status: "complete", payment_status: "paid" });
    const results = await Promise.all([postWebhook(evt), postWebhook(evt), postWebhook(evt)]);
    expect(results.map((r) => r.status)).toEqual([200, 200, 200]);
    expect(results.filter((r) => r.json.outcome === "seats_added")).toHaveLength(1);
    expect(await seatsOf(t.id)).toBe(8);
  });

  it("a manager who reads Spanish gets the receipt in Spanish, the same figures", async () => {
    const t = await testOrg("idioma", 5);
    await db.update(user).set({ language: "es" }).where(eq(user.id, t.manager.id));
    const res = await buy(t.client, 2);
    const [s] = await fakeSessions(res.json.checkoutId as string);
    expect((await postWebhook(sessionEvent("checkout.session.completed", { ...s, status: "complete", payment_status: "paid" }))).json.outcome).toBe("seats_added");
    const two = quote(2, PLANS, CURRENCY)!;
    // messages/es/mail.json receipt.*: "{seats, plural, one {# puesto} other {# puestos}}"
    const mail = await waitForMail(t.manager.email, /Recibo de Riser: 2 puestos para Billing idioma Fire Co/);
    expect(mail.text).toContain("Puestos ahora:    7 (antes: 5)");
    expect(mail.text).toContain(formatMoney(two.amount, CURRENCY));
    expect(mail.text).toMatch(/Recibo:\s+R-\d{6}/);
    expect(mail.text).not.toMatch(/Seats now|Amount paid/);
  });

  it("a late 'expired' event for the paid checkout changes nothing", async () => {
    const [s] = await fakeSessions(checkoutId);
    const late = await postWebhook(sessionEvent("checkout.session.expired", { ...s, status: "expired" }));
    expect(late).toMatchObject({ status: 200, json: { outcome: "already_paid" } });
    const failed = await postWebhook(sessionEvent("checkout.session.async_payment_failed", { ...s }));
    expect(failed.json.outcome).toBe("already_paid");
    expect((await checkoutRow(checkoutId)).status).toBe("paid");
    expect(await seatsOf(quillmoorId)).toBe(seatsBefore + 4);
  });
});

describe("forged and unknown webhooks", () => {
  let paid: { session: Record<string, unknown>; orgId: string };

  beforeAll(async () => {
    const t = await testOrg("forge", 5);
    const res = await buy(t.client, 2);
    const [s] = await fakeSessions(res.json.checkoutId as string);
    paid = { session: { ...s, status: "complete", payment_status: "paid" }, orgId: t.id };
  });

  it("a wrong secret, no signature, a changed body or an old signature → 400 and nothing changes", async () => {
    const evt = sessionEvent("checkout.session.completed", paid.session);
    const before = await totalSeats();
    const wrong = await postWebhook(evt, { secret: "whsec_someone_else_entirely_000000" });
    const none = await postWebhook(evt, { secret: null });
    const tampered = await postWebhook(evt, { raw: JSON.stringify({ ...evt, data: { object: { ...paid.session, amount_total: 1 } } }, null, 2) });
    // replay protection: the provider's SDK refuses signatures older than 300 s by default
    const stale = await postWebhook(evt, { timestamp: Math.floor(Date.now() / 1000) - 600 });
    for (const r of [wrong, none, tampered, stale]) {
      expect(r.status).toBe(400);
      expect(r.json.error).toMatch(/signature/i);
    }
    const empty = await fetch(`${process.env.APP_URL}/api/billing/webhook`, { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
    expect(empty.status).toBe(400);
    expect(await eventRows(evt.id)).toHaveLength(0);
    expect(await totalSeats()).toBe(before);
    expect(await seatsOf(paid.orgId)).toBe(5);
  });

  it("a signed event for an unknown organization → 200, logged, nothing changes", async () => {
    const before = await totalSeats();
    const stranger = sessionEvent("checkout.session.completed", {
      ...paid.session,
      id: `cs_test_${randomUUID().replace(/-/g, "")}`,
      client_reference_id: randomUUID(),
      metadata: { organizationId: randomUUID(), seats: "50" },
    });
    const r = await postWebhook(stranger);
    expect(r).toMatchObject({ status: 200, json: { received: true, outcome: "unknown", seatsAdded: 0 } });
    // a real session of ours whose metadata names another organization is not trusted either
    const misnamed = await postWebhook(sessionEvent("checkout.session.completed", { ...paid.session, metadata: { organizationId: quillmoorId } }));
    expect(misnamed.json.outcome).toBe("unknown");
    expect(await eventRows(stranger.id)).toHaveLength(0);
    expect(await totalSeats()).toBe(before);
  });

  it("a paid amount that differs from the checkout's price adds no seats", async () => {
    const r = await postWebhook(sessionEvent("checkout.session.completed", { ...paid.session, amount_total: 100 }));
    expect(r.json.outcome).toBe("amount_mismatch");
    expect(await seatsOf(paid.orgId)).toBe(5);
  });

  it("events the app does not use are acknowledged and ignored", async () => {
    const r = await postWebhook(sessionEvent("customer.created", { id: "cus_test_1", object: "customer" }));
    expect(r).toMatchObject({ status: 200, json: { outcome: "unhandled" } });
  });
});

describe("declined, delayed and out-of-order payments", () => {
  it("Decline on the fake's page → cancel page, checkout not completed, no seats, cannot be paid afterwards", async () => {
    const t = await testOrg("decline", 5);
    const res = await buy(t.client, 2);
    const id = res.json.checkoutId as string;
    const r = await pressOnPayPage(res.json.url as string, "decline");
    expect(r.status).toBe(303);
    expect(r.headers.get("location")).toBe(`${process.env.APP_URL}/team/billing/cancel?checkout=${id}`);
    await until(async () => (await checkoutRow(id)).status === "expired");
    const [s] = await fakeSessions(id);
    const payAfter = await fetch(`${FAKE}/pay/${s!.id}/pay`, { method: "POST", redirect: "manual" });
    expect(payAfter.status).toBe(409);
    expect(await seatsOf(t.id)).toBe(5);
    const page = await t.client.fetch(`/team/billing/cancel?checkout=${id}`);
    expect(await page.text()).toContain("Nothing was charged and no seats were added");
  });

  it("completed-but-unpaid waits; the later async success adds seats once, in either order", async () => {
    const t = await testOrg("async", 5);
    const a = await buy(t.client, 3);
    const [s] = await fakeSessions(a.json.checkoutId as string);
    const pending = await postWebhook(sessionEvent("checkout.session.completed", { ...s, status: "complete", payment_status: "unpaid" }));
    expect(pending.json.outcome).toBe("awaiting_payment");
    expect((await checkoutRow(a.json.checkoutId as string)).status).toBe("processing");
    expect(await seatsOf(t.id)).toBe(5);
    const ok = await postWebhook(sessionEvent("checkout.session.async_payment_succeeded", { ...s, status: "complete", payment_status: "paid" }));
    expect(ok.json).toMatchObject({ outcome: "seats_added", seatsAdded: 3 });
    expect(await seatsOf(t.id)).toBe(8);

    // the other order: success first, then a late "completed" (paid) and "completed" (unpaid)
    const b = await buy(t.client, 2);
    const [s2] = await fakeSessions(b.json.checkoutId as string);
    expect((await postWebhook(sessionEvent("checkout.session.async_payment_succeeded", { ...s2, status: "complete", payment_status: "paid" }))).json.outcome).toBe("seats_added");
    expect((await postWebhook(sessionEvent("checkout.session.completed", { ...s2, status: "complete", payment_status: "paid" }))).json.outcome).toBe("already_paid");
    expect((await postWebhook(sessionEvent("checkout.session.completed", { ...s2, status: "complete", payment_status: "unpaid" }))).json.outcome).toBe("already_paid");
    expect(await seatsOf(t.id)).toBe(10);
  });

  it("a payment the provider confirms after an 'expired' event is still honoured (never lost)", async () => {
    const t = await testOrg("late-pay", 5);
    const a = await buy(t.client, 1);
    const [s] = await fakeSessions(a.json.checkoutId as string);
    expect((await postWebhook(sessionEvent("checkout.session.expired", { ...s, status: "expired" }))).json.outcome).toBe("checkout_expired");
    expect((await postWebhook(sessionEvent("checkout.session.completed", { ...s, status: "complete", payment_status: "paid" }))).json.outcome).toBe("seats_added");
    expect(await seatsOf(t.id)).toBe(6);
  });
});

describe("access: only managers of the organization and admins", () => {
  const priceTexts = PLANS.map((p) => formatMoney(p.unitAmount, CURRENCY));
  let quillmoorCheckout: string;

  beforeAll(async () => {
    const r = await buy(manager, 1);
    quillmoorCheckout = r.json.checkoutId as string;
  });

  it("a learner gets 403 on every billing page and API, and no price in any answer", async () => {
    const answers = [
      await learner.fetch("/team/billing"),
      await learner.fetch("/team/billing/success?checkout=" + quillmoorCheckout),
      await learner.fetch("/team/billing/cancel"),
      await learner.fetch("/api/billing"),
      await learner.fetch(`/api/billing/checkout/${quillmoorCheckout}`),
      await learner.fetch("/api/billing/checkout", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ seats: 5, idempotencyKey: newKey() }) }),
    ];
    for (const res of answers) {
      expect(res.status).toBe(403);
      const text = await res.text();
      for (const price of priceTexts) expect(text).not.toContain(price);
    }
    const home = await (await learner.fetch("/learn")).text();
    for (const price of priceTexts) expect(home).not.toContain(price);
  });

  it("anonymous → 401 on the APIs and the sign-in page for the pages", async () => {
    const a = anonymous();
    expect((await a.fetch("/api/billing")).status).toBe(401);
    expect((await postJson(a, "/api/billing/checkout", { seats: 1, idempotencyKey: newKey() })).status).toBe(401);
    const page = await a.fetch("/team/billing");
    expect(page.status).toBe(307);
    expect(page.headers.get("location")).toContain("/sign-in");
  });

  it("another organization's manager cannot see or buy for this one", async () => {
    expect((await otherManager.fetch(`/api/billing/checkout/${quillmoorCheckout}`)).status).toBe(404);
    expect((await otherManager.fetch(`/api/billing?org=${quillmoorId}`)).status).toBe(403);
    expect((await otherManager.fetch(`/team/billing?org=${quillmoorId}`)).status).toBe(403);
    expect((await buy(otherManager, 2, newKey(), { org: quillmoorId })).status).toBe(403);
    const own = await (await otherManager.fetch("/api/billing")).json();
    expect(own.organization.orgName).toBe("Larkhaven Homes");
  });

  it("an admin sees every organization and buys for one only by naming it", async () => {
    const all = await (await admin.fetch("/api/billing")).json();
    expect(all.organizations.map((o: { orgId: string }) => o.orgId)).toContain(quillmoorId);
    expect((await buy(admin, 2)).status).toBe(400);
    const forQuillmoor = await buy(admin, 2, newKey(), { org: quillmoorId });
    expect(forQuillmoor.status).toBe(201);
    expect((await admin.fetch(`/api/billing/checkout/${quillmoorCheckout}`)).status).toBe(200);
    expect((await admin.fetch(`/team/billing?org=${quillmoorId}`)).status).toBe(200);
  });

  it("bad input gets field errors, never a 500", async () => {
    for (const seats of [0, -3, 501, 2.5, "many"]) {
      const r = await buy(manager, seats as number);
      expect(r.status).toBe(400);
      expect(r.json.fieldErrors).toHaveProperty("seats");
    }
    const noKey = await postJson(manager, "/api/billing/checkout", { seats: 3 });
    expect(noKey.status).toBe(400);
    expect(noKey.json.fieldErrors).toHaveProperty("idempotencyKey");
    const notJson = await manager.fetch("/api/billing/checkout", { method: "POST", headers: { "content-type": "application/json" }, body: "seats=3" });
    expect(notJson.status).toBe(400);
    const crossSite = await manager.fetch("/api/billing/checkout", {
      method: "POST",
      headers: { "content-type": "application/json", origin: "http://elsewhere.example" },
      body: JSON.stringify({ seats: 3, idempotencyKey: newKey() }),
    });
    expect(crossSite.status).toBe(403);
  });
});

describe("seat limit (assertSeatAvailable, called by the invite API and the CSV import)", () => {
  async function openInvites(orgId: string, n: number) {
    const at = new Date();
    for (let i = 0; i < n; i++) {
      await db.insert(invitation).values({
        id: randomUUID(),
        organizationId: orgId,
        email: `invitee-${randomUUID().slice(0, 8)}@test.example`,
        role: "learner",
        tokenHash: randomUUID().replace(/-/g, "").padEnd(64, "0"),
        createdAt: at,
        expiresAt: new Date(at.getTime() + 7 * 86_400_000),
      });
    }
  }

  it("members + open invitations must fit; the refusal names the seats and links to billing; buying seats lifts it", async () => {
    const t = await testOrg("limit", 4); // 1 manager + 2 learners + 1 open invitation = 4 of 4
    await createPeople(2, { organizationId: t.id, tag: "bill-limit-l" });
    await openInvites(t.id, 1);
    const err = await assertSeatAvailable(t.id, 1).catch((e) => e);
    expect(err).toBeInstanceOf(SeatLimitError);
    expect(err.message).toMatch(/has 4 seats; buy more on the billing page/);
    const answer = errorResponse(err); // the one error mapping every route handler uses
    expect(answer.status).toBe(409);
    const body = await answer.json();
    expect(body).toMatchObject({ error: err.message, seats: 4, used: 4, requested: 1, billingUrl: BILLING_PATH });

    // a CSV import of 3 rows is checked as one request for 3 seats
    const res = await buy(t.client, 3);
    await pressOnPayPage(res.json.url as string, "pay");
    await until(async () => (await seatsOf(t.id)) === 7);
    await expect(assertSeatAvailable(t.id, 3)).resolves.toMatchObject({ seats: 7, members: 3, pending: 1 });
    await expect(assertSeatAvailable(t.id, 4)).rejects.toBeInstanceOf(SeatLimitError);
  });

  it("the invite API and the CSV import stop at the seat count with the billing link, and go on after a purchase", async () => {
    const t = await testOrg("invite", 3); // the manager is 1 of 3
    await createPeople(1, { organizationId: t.id, tag: "bill-inv-l" }); // 2 of 3
    const invite = (email: string) => postJson(t.client, "/api/team/invites", { email, role: "learner" });
    const upload = async (path: string, csv: string, fileHash?: string) => {
      const form = new FormData();
      form.set("file", new Blob([csv], { type: "text/csv" }), "roster.csv");
      if (fileHash) form.set("fileHash", fileHash);
      const res = await t.client.fetch(path, { method: "POST", body: form });
      return { status: res.status, json: await res.json() };
    };

    expect((await invite(uniqueEmail("last-seat"))).status).toBe(201); // the last free seat can be used
    const over = await invite(uniqueEmail("over"));
    expect(over.status).toBe(409);
    expect(over.json).toMatchObject({ seats: 3, used: 3, requested: 1, billingUrl: BILLING_PATH });
    expect(over.json.error).toMatch(/has 3 seats; buy more on the billing page/);

    const csv = ["email,name,role,team", ...[1, 2, 3].map((i) => `${uniqueEmail(`csv${i}`)},Roster Person ${i},learner,`)].join("\n");
    const full = await upload("/api/team/invites/preview", csv);
    expect(full.status).toBe(200);
    expect(full.json.valid).toBe(0);
    for (const row of full.json.rows) expect(row.problems.join(" ")).toMatch(/Over the seat count.*billing page/);
    const none = await upload("/api/team/invites/import", csv, full.json.fileHash);
    expect(none.json).toMatchObject({ imported: 0, skipped: 3 });

    const res = await buy(t.client, 2);
    await pressOnPayPage(res.json.url as string, "pay");
    await until(async () => (await seatsOf(t.id)) === 5);
    const two = await upload("/api/team/invites/preview", csv);
    expect(two.json).toMatchObject({ valid: 2, invalid: 1 });
    const imported = await upload("/api/team/invites/import", csv, two.json.fileHash);
    expect(imported.status).toBe(201);
    expect(imported.json).toMatchObject({ imported: 2, skipped: 1 });
    expect((await invite(uniqueEmail("after"))).status).toBe(409); // 2 people + 3 open invitations = 5 of 5
  });

  it("a running trial's seats count; an ended trial's do not, with a message that says so; a purchase ends the trial", async () => {
    const running = await testOrg("trial-on", TRIAL.seats, new Date(Date.now() + 5 * 86_400_000));
    await expect(assertSeatAvailable(running.id, TRIAL.seats - 1)).resolves.toMatchObject({ seats: TRIAL.seats, trial: "active" });

    const ended = await testOrg("trial-off", TRIAL.seats, new Date(Date.now() - 86_400_000));
    const err = await assertSeatAvailable(ended.id, 1).catch((e) => e);
    expect(err).toBeInstanceOf(SeatLimitError);
    expect(err.message).toMatch(/trial ended on \d{4}-\d{2}-\d{2}; buy seats on the billing page/);
    const res = await buy(ended.client, 5);
    await pressOnPayPage(res.json.url as string, "pay");
    await until(async () => (await seatsOf(ended.id)) === 5); // the ended trial's seats lapsed: 0 + 5
    const [o] = await db.select({ trialEndsAt: organization.trialEndsAt }).from(organization).where(eq(organization.id, ended.id));
    expect(o!.trialEndsAt).toBeNull();
    await expect(assertSeatAvailable(ended.id, 4)).resolves.toMatchObject({ seats: 5, trial: "none" });
  });
});
