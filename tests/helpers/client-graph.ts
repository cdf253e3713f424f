/**
 * The module graph as the browser sees it, for tests/unit/i18n-catalogs.test.ts: from every route
 * file under app/ (pages, layouts, error and not-found boundaries), the modules it imports, which of
 * them run in the browser (a "use client" file and everything it imports), and which message scopes
 * (lib/i18n/client-namespaces.ts) cover them: a layout that renders <ScopedMessages scope="x">
 * covers every route below it, and any module that renders one covers what it imports.
 * Type-only imports bring no code and are skipped; dynamic import("…") counts as an import.
 */
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";

export const ROOT = path.resolve(import.meta.dirname, "../..");
const ROUTE_FILE = /^(page|layout|template|error|global-error|not-found|forbidden|unauthorized|loading|default)\.tsx?$/;
const EXTS = [".tsx", ".ts", "/index.tsx", "/index.ts"];

const text = new Map<string, string>();
export function source(file: string): string {
  if (!text.has(file)) text.set(file, readFileSync(file, "utf8"));
  return text.get(file)!;
}

function resolve(from: string, spec: string): string | null {
  let base: string;
  if (spec.startsWith("@/")) base = path.join(ROOT, spec.slice(2));
  else if (spec.startsWith(".")) base = path.resolve(path.dirname(from), spec);
  else return null; // a package
  if (existsSync(base) && statSync(base).isFile()) return /\.tsx?$/.test(base) ? base : null;
  for (const e of EXTS) if (existsSync(base + e)) return base + e;
  return null;
}

/** The modules a file imports at run time (static, re-exports and dynamic import()). */
export function importsOf(file: string): string[] {
  const src = source(file);
  const specs = [
    ...[...src.matchAll(/^\s*(?:import|export)\s+(?!type\s)(?:[^"';]*?\sfrom\s+)?["']([^"']+)["']/gm)].map((m) => m[1]!),
    ...[...src.matchAll(/import\(\s*["']([^"']+)["']\s*\)/g)].map((m) => m[1]!),
  ];
  return [...new Set(specs.map((s) => resolve(file, s)).filter((f): f is string => f !== null))];
}

export const isClient = (file: string) => /^\s*["']use client["']/.test(source(file));
/** The scopes a module opens for what it renders: <ScopedMessages scope="x">. */
export const scopesOpenedBy = (file: string) => [...source(file).matchAll(/<ScopedMessages\s+scope="([^"]+)"/g)].map((m) => m[1]!);
/** The namespaces a module reads with useTranslations ("(no namespace)" for a bare call). */
export const namespacesReadBy = (file: string) =>
  [...source(file).matchAll(/useTranslations\(\s*(?:"([^"]*)")?\s*\)/g)].map((m) => m[1] ?? "(no namespace)");

function walkDir(d: string, out: string[] = []): string[] {
  for (const e of readdirSync(d, { withFileTypes: true })) {
    const p = path.join(d, e.name);
    if (e.isDirectory()) walkDir(p, out);
    else out.push(p);
  }
  return out;
}

export const routeFiles = () => walkDir(path.join(ROOT, "app")).filter((f) => ROUTE_FILE.test(path.basename(f)));

/** The scopes the layouts above a route file (and a layout itself) open for it. */
export function layoutScopes(file: string): string[] {
  // MDX is rendered only by the lesson and reference-card pages, both inside the "lessons" scope
  if (file === path.join(ROOT, "mdx-components.tsx")) return ["lessons"];
  const scopes: string[] = [];
  for (let d = path.dirname(file); d.startsWith(path.join(ROOT, "app")); d = path.dirname(d)) {
    const layout = path.join(d, "layout.tsx");
    if (existsSync(layout) && layout !== path.join(ROOT, "app/layout.tsx")) scopes.push(...scopesOpenedBy(layout));
  }
  return scopes;
}

export interface Reading {
  file: string; // the module that calls useTranslations
  namespace: string;
  scopes: string[]; // the scopes covering it on this path
  entry: string; // the route file it was reached from
}

/** Every useTranslations call that runs in the browser, once per distinct covering set of scopes. */
export function clientReadings(entries = routeFiles()): { readings: Reading[]; reached: Set<string> } {
  const readings: Reading[] = [];
  const reached = new Set<string>();
  const seen = new Set<string>();
  const visit = (file: string, client: boolean, scopes: string[], entry: string) => {
    const inClient = client || isClient(file);
    const key = `${file}|${inClient}|${[...new Set(scopes)].sort().join(",")}`;
    if (seen.has(key)) return;
    seen.add(key);
    reached.add(file);
    if (inClient) for (const namespace of namespacesReadBy(file)) readings.push({ file, namespace, scopes: [...new Set(scopes)].sort(), entry });
    const inner = [...scopes, ...scopesOpenedBy(file)];
    for (const dep of importsOf(file)) visit(dep, inClient, inner, entry);
  };
  for (const entry of entries) visit(entry, false, layoutScopes(entry), entry);
  return { readings, reached };
}
