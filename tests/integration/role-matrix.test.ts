// Every route × every role (and anonymous) gets the expected status. A page or route handler that
// is not listed in lib/access/routes.ts fails the first test.
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { demoByRole } from "@/db/demo";
import { ROUTES, type RouteEntry } from "@/lib/access/routes";
import { roleSatisfies, type Role } from "@/lib/access/rules";
import { anonymous, signIn, type Client } from "../helpers/http";

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
