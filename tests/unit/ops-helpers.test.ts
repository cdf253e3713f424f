// Small pure pieces of operations: row counts read from mariadb-dump output (both layouts the
// client writes), object keys that may not leave the archive, schema-version checks, the request
// id rule (a client's id is kept only behind a trusted proxy) and metric route patterns.
import { describe, expect, it } from "vitest";
import { DumpRowCounter, newerSchemaProblem, objectPath, schemaVersionOf } from "../../scripts/lib/backup-format";
import { routePattern } from "@/lib/metrics";
import { requestIdFor } from "@/lib/request-id";

const count = (text: string) => {
  const c = new DumpRowCounter();
  for (const line of text.split("\n")) c.feed(line);
  return c.rows;
};

describe("DumpRowCounter", () => {
  it("counts rows written one per line (MariaDB 10.11+) and several per line (older clients)", () => {
    const perLine = ["INSERT INTO `user` VALUES", "('a','Ann (North crew)','x@y.example'),", "('b','it\\'s (not) a row; really','z'),", "('c','back\\\\slash',NULL);", "INSERT INTO `team` VALUES ('t1','A'),('t2','B; C');"].join("\n");
    expect(count(perLine)).toEqual({ user: 3, team: 2 });
  });
  it("ignores everything but INSERT statements and handles quoted table names", () => {
    expect(count("-- (comment)\nCREATE TABLE `x` (\n  `id` int\n);\nINSERT INTO `we``ird` VALUES (1),(2),(3);")).toEqual({ "we`ird": 3 });
  });
});

describe("backup manifest checks", () => {
  const entries = [
    { idx: 0, when: 100, tag: "0000_init" },
    { idx: 1, when: 200, tag: "0001_more" },
  ];
  it("names the schema by its last migration and refuses only newer or unknown ones", () => {
    expect(schemaVersionOf(200, 2, entries)).toEqual({ tag: "0001_more", when: 200, applied: 2 });
    expect(newerSchemaProblem({ tag: "0000_init", when: 100, applied: 1 }, entries)).toBeNull();
    expect(newerSchemaProblem({ tag: "0001_more", when: 200, applied: 2 }, entries)).toBeNull();
    expect(newerSchemaProblem({ tag: "0002_next", when: 300, applied: 3 }, entries)).toMatch(/newer/);
    expect(newerSchemaProblem({ tag: "0001_other_branch", when: 150, applied: 2 }, entries)).toMatch(/not one of/);
  });
  it("keeps object keys inside objects/", () => {
    expect(objectPath("sign-offs/u/s/f.jpg")).toBe("objects/sign-offs/u/s/f.jpg");
    for (const bad of ["../etc/passwd", "/abs", "a/../../b", "a//b", "a\\b", ""]) expect(() => objectPath(bad)).toThrow(/unsafe/);
  });
});

describe("request id", () => {
  const h = (id?: string) => new Headers(id ? { "x-request-id": id } : {});
  it("makes a new id unless a trusted proxy stands in front", () => {
    expect(requestIdFor(h("client-chosen-id-1"), 0)).not.toBe("client-chosen-id-1");
    expect(requestIdFor(h(), 0)).toMatch(/^[0-9a-f-]{36}$/);
    expect(requestIdFor(h("proxy-set-id-12345"), 1)).toBe("proxy-set-id-12345");
    expect(requestIdFor(h("bad id with spaces\n"), 1)).not.toContain(" ");
    expect(requestIdFor(h("x".repeat(200)), 1)).toHaveLength(36);
  });
});

describe("routePattern", () => {
  it("puts param names in place of their values", () => {
    expect(routePattern("/api/certificates/42/pdf", { id: "42" })).toBe("/api/certificates/[id]/pdf");
    expect(routePattern("/api/sign-offs/ab/evidence/cd", { id: "ab", evidenceId: "cd" })).toBe("/api/sign-offs/[id]/evidence/[evidenceId]");
    expect(routePattern("/api/auth/sign-in/email", { all: ["sign-in", "email"] })).toBe("/api/auth/[...all]");
    expect(routePattern("/api/verify/a%20b", { code: "a b" })).toBe("/api/verify/[code]");
    expect(routePattern("/api/health/live", {})).toBe("/api/health/live");
  });
});
