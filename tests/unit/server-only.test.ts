// Every module in lib/ (and db/client.ts) that reaches the database, better-auth's server instance or
// the mailer, directly or through another module, must start with `import "server-only"`, so that a
// client component importing it fails the build instead of shipping secrets or a DB driver to the
// browser. (Next.js docs, "Server and Client Components": keeping server-only code out of the client.)
// The import graph comes from dependency-cruiser, the same tool that enforces the import rules in
// `npm run lint` (.dependency-cruiser.cjs), so no import parsing is written by hand here.
import path from "node:path";
import { cruise, type IModule } from "dependency-cruiser";
import extractTSConfig from "dependency-cruiser/config-utl/extract-ts-config";
import { beforeAll, describe, expect, it } from "vitest";

const root = path.resolve(import.meta.dirname, "../..");

/** Modules and their run-time dependencies (type-only imports are erased by the compiler). */
async function graph(paths: string[]): Promise<Map<string, string[]>> {
  const cwd = process.cwd();
  process.chdir(root);
  try {
    const tsConfig = extractTSConfig(path.join(root, "tsconfig.json"));
    const result = await cruise(
      paths,
      { tsPreCompilationDeps: true, doNotFollow: { path: ["node_modules"] }, exclude: { path: ["^\\.next"] }, tsConfig: { fileName: "tsconfig.json" } },
      { extensions: [".ts", ".tsx", ".mjs", ".js", ".json"] },
      { tsConfig },
    );
    const modules = (typeof result.output === "string" ? [] : result.output.modules) as IModule[];
    return new Map(modules.map((m) => [m.source, m.dependencies.filter((d) => !d.dependencyTypes.includes("type-only")).map((d) => d.resolved)]));
  } finally {
    process.chdir(cwd);
  }
}

// What must never reach a browser bundle: the DB pool, the better-auth server instance, the mailer.
const SERVER_ROOTS = ["db/client.ts", "lib/auth/index.ts", "lib/mail/index.ts"];

function serverBound(imports: Map<string, string[]>): Map<string, string[]> {
  // why[file] = chain of modules through which the file reaches a server root
  const why = new Map<string, string[]>(SERVER_ROOTS.map((r) => [r, [r]]));
  let changed = true;
  while (changed) {
    changed = false;
    for (const [file, deps] of imports) {
      if (why.has(file)) continue;
      const hit = deps.find((d) => why.has(d));
      if (hit) {
        why.set(file, [file, ...why.get(hit)!]);
        changed = true;
      }
    }
  }
  return why;
}

describe("server-only guard", () => {
  let imports = new Map<string, string[]>();
  let bound = new Map<string, string[]>();
  beforeAll(async () => {
    imports = await graph(["lib", "db/client.ts", "db/schema"]);
    bound = serverBound(imports);
  }, 60_000);

  it("finds the modules that reach the database, auth or mail (the scan itself works)", () => {
    const names = [...bound.keys()];
    // Known members: the roots and modules that import them directly.
    expect(names).toEqual(expect.arrayContaining(["db/client.ts", "lib/auth/index.ts", "lib/mail/index.ts", "lib/audit/index.ts", "lib/access/index.ts", "lib/admin/people.ts", "lib/account/records.ts"]));
    // Browser-safe modules are not flagged: the auth client, shared form schemas, pure access rules.
    for (const safe of ["lib/auth/browser.ts", "lib/auth/schemas.ts", "lib/access/rules.ts", "lib/admin/schemas.ts", "lib/csv/safe.ts"]) {
      if (imports.has(safe)) expect(names).not.toContain(safe);
    }
  });

  it("every such module in lib/ and db/client.ts imports server-only", () => {
    const missing = [...bound.entries()]
      .filter(([file]) => imports.has(file) && !(imports.get(file) ?? []).some((d) => /(^|\/)server-only\//.test(d)))
      .map(([, chain]) => chain.join(" → "));
    expect(missing, `modules without import "server-only" (first → what it reaches):\n${missing.join("\n")}`).toEqual([]);
  });

  it("reads imports the way the bundler does (type-only imports do not count)", async () => {
    const g = await graph(["tests/fixtures/imports"]);
    const deps = g.get("tests/fixtures/imports/entry.ts") ?? [];
    expect(deps).toContain("tests/fixtures/imports/value.ts");
    expect(deps).toContain("tests/fixtures/imports/lazy.ts");
    expect(deps).not.toContain("tests/fixtures/imports/types.ts");
    expect(deps.some((d) => /(^|\/)server-only\//.test(d))).toBe(true);
  }, 60_000);
});
