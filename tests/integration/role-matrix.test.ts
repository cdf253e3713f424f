// Every route × every role (and anonymous) gets the expected status. A page or route handler that
// is not listed in lib/access/routes.ts fails the first test.
import { randomUUID } from "node:crypto";
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { and, eq } from "drizzle-orm";
import { PDFDocument } from "pdf-lib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { assignment, certificate, jurisdiction, localAmendment, signOffEvidence } from "@/db/schema";
import { demoByRole } from "@/db/demo";
import { ROUTES, type RouteEntry } from "@/lib/access/routes";
import { roleSatisfies, type Role } from "@/lib/access/rules";
import { anonymous, freshIp, postJson, signIn, type Client } from "../helpers/http";
import { answersFor, catalog } from "../helpers/quiz";
import { TEST_PASSWORD, createOrganization, createPeople, readAndComplete } from "../helpers/fixtures";

function discoverRoutes(dir: string, prefix = ""): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) {
      const seg = /^\(.*\)$/.test(name) ? "" : `/${name}`; // route groups add no segment
      out.push(...discoverRoutes(p, prefix + seg));
    } else if (/^(page|route)\.(tsx?|mdx)$/.test(name)) {
      out.push(prefix || "/");
    }
  }
  return out;
}

const ROLES: Role[] = ["learner", "sales", "manager", "admin"];
const clients: Partial<Record<Role | "anonymous", Client>> = {};

beforeAll(async () => {
  clients.anonymous = anonymous();
  for (const role of ROLES) clients[role] = await signIn(demoByRole(role).email);
});

function expected(entry: RouteEntry, who: Role | "anonymous"): number[] {
  const api = entry.route.startsWith("/api/");
  const ok = [entry.okStatus ?? 200];
  if (entry.rule === "public") return ok;
  if (who === "anonymous") return api ? [401] : [307];
  return roleSatisfies(who, entry.rule) ? ok : [403];
}

describe("role matrix", () => {
  it("lists every page and route handler of app/", () => {
    const found = discoverRoutes(path.resolve("app")).sort();
    const listed = new Set(ROUTES.map((r) => r.route));
    const missing = found.filter((r) => !listed.has(r));
    expect(missing, `routes without an access rule in lib/access/routes.ts: ${missing.join(", ")}`).toEqual([]);
    const stale = [...listed].filter((r) => !found.includes(r));
    expect(stale, `rules for routes that no longer exist: ${stale.join(", ")}`).toEqual([]);
  });

  for (const entry of ROUTES) {
    for (const who of ["anonymous", ...ROLES] as const) {
      it(`${entry.method ?? "GET"} ${entry.sample ?? entry.route} as ${who}`, async () => {
        const client = clients[who]!;
        const init: RequestInit = { method: entry.method ?? "GET" };
        if (init.method !== "GET") {
          init.headers = { "content-type": "application/json" };
          init.body = "{}";
        }
        const res = await client.fetch(entry.sample ?? entry.route, init);
        expect(expected(entry, who)).toContain(res.status);
        if (res.status === 307) expect(res.headers.get("location")).toContain("/sign-in");
      });
    }
  }
});

/**
 * Every by-id route again, now with real ids that belong to *another* organization (a contractor
 * the test creates: its learner's graded attempt, certificate, sign-off with PDF evidence, its
 * manager's checkout and assignment). Learners, sales staff and managers of the demo contractor
 * must get 403 or 404 and never a byte of that organization's data.
 */
describe("role matrix across organizations", () => {
  const foreign = { orgId: "", learnerId: "", learnerEmail: "", learnerName: "", attemptId: "", certificateId: 0, serial: "", signOffId: "", evidenceId: "", checkoutId: "", assignmentId: 0, jurisdictionId: "", teamId: "" };
  const FOREIGN_RULE = "Cross-organization local rule: pressure-test every loop twice";

  beforeAll(async () => {
    const org = await createOrganization("Cross-Org Sprinkler Co");
    foreign.orgId = org.id;
    foreign.teamId = org.teamId;
    const [learner] = await createPeople(1, { organizationId: org.id, teamId: org.teamId, tag: "xorg-learner" });
    const [manager] = await createPeople(1, { organizationId: org.id, role: "manager", tag: "xorg-manager" });
    Object.assign(foreign, { learnerId: learner!.id, learnerEmail: learner!.email, learnerName: learner!.name });
    const lc = await signIn(learner!.email, TEST_PASSWORD, freshIp());
    const mc = await signIn(manager!.email, TEST_PASSWORD, freshIp());

    const MODULE = "talking-with-homebuyers";
    const mod = catalog.modules.find((m) => m.slug === MODULE)!;
    await readAndComplete(lc, learner!.id, MODULE, mod.lessons.map((l) => l.slug));
    const a = await postJson(lc, "/api/quiz/attempts", { module: MODULE });
    foreign.attemptId = a.json.id as string;
    expect((await postJson(lc, `/api/quiz/attempts/${foreign.attemptId}/submit`, { answers: await answersFor(foreign.attemptId) })).json.passed).toBe(true);
    const [cert] = await db.select().from(certificate).where(and(eq(certificate.userId, learner!.id), eq(certificate.kind, "module")));
    foreign.certificateId = cert!.id;
    foreign.serial = cert!.serial;

    const doc = await PDFDocument.create();
    doc.addPage([200, 200]);
    const form = new FormData();
    form.set("module", "pipe-and-joining");
    form.set("skill", "pj-support-and-restrain");
    form.append("files", new Blob([Buffer.from(await doc.save())], { type: "application/pdf" }), "record.pdf");
    const so = await lc.fetch("/api/sign-offs", { method: "POST", body: form });
    expect(so.status).toBe(201);
    foreign.signOffId = ((await so.json()) as { id: string }).id;
    foreign.evidenceId = (await db.select().from(signOffEvidence).where(eq(signOffEvidence.signOffId, foreign.signOffId)))[0]!.id;

    const co = await postJson(mc, "/api/billing/checkout", { seats: 1, idempotencyKey: randomUUID() });
    expect(co.status, co.text).toBe(201);
    foreign.checkoutId = co.json.checkoutId as string;
    const due = new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10);
    const as = await postJson(mc, "/api/team/assignments", { kind: "module", slug: MODULE, userIds: [learner!.id], dueAt: due });
    expect(as.status, as.text).toBeLessThan(300);
    foreign.assignmentId = (await db.select().from(assignment).where(eq(assignment.organizationId, org.id)))[0]!.id;
    const j = await postJson(mc, "/api/team/jurisdictions", { name: "Quarry Bend", state: "OR", edition: 2019, ircP2904: true });
    expect(j.status, j.text).toBe(201);
    foreign.jurisdictionId = j.json.id as string;
    expect((await postJson(mc, "/api/team/amendments", { topic: "freeze", body: FOREIGN_RULE })).status).toBe(200);
  }, 120_000);
  afterAll(() => pool.end());

  const requests = () => [
    { method: "GET", path: `/api/quiz/attempts/${foreign.attemptId}` },
    { method: "PUT", path: `/api/quiz/attempts/${foreign.attemptId}/answers`, body: { answers: [] } },
    { method: "POST", path: `/api/quiz/attempts/${foreign.attemptId}/submit`, body: {} },
    { method: "GET", path: `/api/quiz/attempts?userId=${foreign.learnerId}` },
    { method: "GET", path: `/api/progress?userId=${foreign.learnerId}&module=talking-with-homebuyers` },
    { method: "GET", path: `/api/certificates/${foreign.certificateId}/pdf` },
    { method: "POST", path: `/api/certificates/${foreign.certificateId}/revoke`, body: { reason: "cross-organization probe" } },
    { method: "POST", path: `/api/sign-offs/${foreign.signOffId}/review`, body: { decision: "approve", status: "approved", comment: "looks fine" } },
    { method: "GET", path: `/api/sign-offs/${foreign.signOffId}/evidence/${foreign.evidenceId}` },
    { method: "GET", path: `/api/sign-offs/${foreign.signOffId}/evidence/${foreign.evidenceId}?thumb=1` },
    { method: "GET", path: `/api/billing/checkout/${foreign.checkoutId}` },
    { method: "DELETE", path: `/api/team/assignments/${foreign.assignmentId}` },
    { method: "GET", path: `/team/people/${foreign.learnerId}` },
    { method: "GET", path: `/api/team/people/${foreign.learnerId}/training-history?format=pdf` },
    { method: "GET", path: `/api/team/people/${foreign.learnerId}/training-history?format=csv` },
    { method: "GET", path: `/api/team/teams/${foreign.teamId}/training-history` },
    { method: "POST", path: `/api/team/jurisdictions/${foreign.jurisdictionId}`, body: { edition: 2025 } },
    { method: "DELETE", path: `/api/team/jurisdictions/${foreign.jurisdictionId}` },
    { method: "DELETE", path: `/api/team/amendments/freeze?org=${foreign.orgId}` },
  ];

  for (const who of ["learner", "sales", "manager"] as const) {
    it(`${who} of another organization gets 403/404 and none of its data`, async () => {
      const client = clients[who]!;
      for (const r of requests()) {
        const init: RequestInit = { method: r.method };
        if (r.body) {
          init.headers = { "content-type": "application/json" };
          init.body = JSON.stringify(r.body);
        }
        const res = await client.fetch(r.path, init);
        const text = await res.text();
        expect([403, 404], `${r.method} ${r.path} as ${who}: ${res.status} ${text.slice(0, 200)}`).toContain(res.status);
        for (const secret of [foreign.learnerEmail, foreign.learnerName, foreign.serial, foreign.orgId]) {
          expect(text.includes(secret), `${r.method} ${r.path} as ${who} leaks ${secret}`).toBe(false);
        }
      }
      // nothing changed: the attempt is still graded once, the certificate valid, the sign-off waiting, the assignment there
      const [cert] = await db.select({ revokedAt: certificate.revokedAt }).from(certificate).where(eq(certificate.id, foreign.certificateId));
      expect(cert!.revokedAt).toBeNull();
      expect(await db.select().from(assignment).where(eq(assignment.id, foreign.assignmentId))).toHaveLength(1);
      const [j] = await db.select().from(jurisdiction).where(eq(jurisdiction.id, foreign.jurisdictionId));
      expect(j!.edition).toBe(2019);
      expect(await db.select().from(localAmendment).where(eq(localAmendment.organizationId, foreign.orgId))).toHaveLength(1);
      // the other organization's local rule never shows on the viewer's lessons and cards of that topic
      for (const page of ["/reference/antifreeze-systems", "/modules/freeze-protection/antifreeze-limits"]) {
        expect(await (await client.fetch(page)).text(), `${page} as ${who}`).not.toContain(FOREIGN_RULE);
      }
    });
  }
});
