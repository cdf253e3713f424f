// Every module in lib/ (and db/client.ts) that reaches the database, better-auth's server instance or
// the mailer, directly or through another module, must start with `import "server-only"`, so that a
// client component importing it fails the build instead of shipping secrets or a DB driver to the
// browser. (Next.js docs, "Server and Client Components": keeping server-only code out of the client.)
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const root = path.resolve(import.meta.dirname, "../..");
const SOURCE = /\.(ts|tsx|mts|mjs)$/;

function walk(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) out.push(...walk(p));
    else if (SOURCE.test(name) && !name.endsWith(".d.ts")) out.push(p);
  }
  return out;
}

/** Module specifiers a file loads at run time: static imports and re-exports (not `import type`), dynamic imports. */
function runtimeImports(source: string): string[] {
  const code = source.replace(/\/\*[\s\S]*?\*\//g, "").replace(/(^|[^:])\/\/.*$/gm, "$1");
  const specs: string[] = [];
  for (const m of code.matchAll(/(?:^|;|\n)\s*(import|export)\s+(type\s+)?([^'";]*?\sfrom\s+)?["']([^"']+)["']/g)) {
    if (m[2]) continue; // import type / export type
    specs.push(m[4]!);
  }
  for (const m of code.matchAll(/\bimport\(\s*["']([^"']+)["']\s*\)/g)) specs.push(m[1]!);
  return specs;
}

function resolve(fromFile: string, spec: string): string | null {
  let base: string;
  if (spec.startsWith("@/")) base = path.join(root, spec.slice(2));
  else if (spec.startsWith(".")) base = path.resolve(path.dirname(fromFile), spec);
  else return null;
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, `${base}.mjs`, path.join(base, "index.ts"), path.join(base, "index.tsx")]) {
    if (existsSync(candidate) && statSync(candidate).isFile()) return candidate;
  }
  return null;
}

const rel = (f: string) => path.relative(root, f);
// What must never reach a browser bundle: the DB pool, the better-auth server instance, the mailer.
const SERVER_ROOTS = ["db/client.ts", "lib/auth/index.ts", "lib/mail/index.ts"];

function serverBoundModules(files: string[]): Map<string, string[]> {
  const imports = new Map(files.map((f) => [f, runtimeImports(readFileSync(f, "utf8")).map((s) => resolve(f, s)).filter((r): r is string => r !== null)]));
  // why[file] = chain of modules through which the file reaches a server root
  const why = new Map<string, string[]>(SERVER_ROOTS.map((r) => [path.join(root, r), [r]]));
  let changed = true;
  while (changed) {
    changed = false;
    for (const [file, deps] of imports) {
      if (why.has(file)) continue;
      const hit = deps.find((d) => why.has(d));
      if (hit) {
        why.set(file, [rel(file), ...why.get(hit)!]);
        changed = true;
      }
    }
  }
  return why;
}

const hasServerOnly = (file: string) => /^\s*import\s+["']server-only["'];?/m.test(readFileSync(file, "utf8"));

describe("server-only guard", () => {
  const files = [...walk(path.join(root, "lib")), path.join(root, "db/client.ts"), ...walk(path.join(root, "db/schema"))];
  const bound = serverBoundModules(files);

  it("finds the modules that reach the database, auth or mail (the scan itself works)", () => {
    const names = [...bound.keys()].map(rel);
    // Known members: the roots and modules that import them directly.
    expect(names).toEqual(expect.arrayContaining(["db/client.ts", "lib/auth/index.ts", "lib/mail/index.ts", "lib/audit/index.ts", "lib/access/index.ts", "lib/admin/people.ts", "lib/account/records.ts"]));
    // Browser-safe modules are not flagged: the auth client, shared form schemas, pure access rules.
    for (const safe of ["lib/auth/client.ts", "lib/auth/schemas.ts", "lib/access/rules.ts", "lib/admin/schemas.ts", "lib/csv/safe.ts"]) {
      if (existsSync(path.join(root, safe))) expect(names).not.toContain(safe);
    }
  });

  it("every such module in lib/ and db/client.ts imports server-only", () => {
    const missing = [...bound.entries()].filter(([file]) => files.includes(file) && !hasServerOnly(file)).map(([, chain]) => chain.join(" → "));
    expect(missing, `modules without import "server-only" (first → what it reaches):\n${missing.join("\n")}`).toEqual([]);
  });

  it("parses imports the way the bundler does (type-only imports do not count)", () => {
    const src = `import type { Db } from "@/db/client";\nimport { x } from "./a";\nexport * from "./b";\nconst m = await import("@/lib/mail");\n// import { y } from "./commented";\nimport "server-only";`;
    expect(runtimeImports(src)).toEqual(["./a", "./b", "server-only", "@/lib/mail"]);
  });
});
