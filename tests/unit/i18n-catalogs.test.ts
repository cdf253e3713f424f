/**
 * The message catalogs (messages/<locale>/<namespace>.json): every key exists in English and Spanish,
 * every message is valid ICU MessageFormat (parsed with FormatJS's own parser, the one next-intl
 * formats with), and both languages use the same arguments, so a Spanish page never shows a raw key
 * or loses a number. Also the Accept-Language negotiation (RFC 9110 §12.5.4 q-values).
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { parse, TYPE, type MessageFormatElement } from "@formatjs/icu-messageformat-parser";
import { describe, expect, it } from "vitest";
import { BASE_NAMESPACES, LOCALES, negotiateLocale, SCOPED_NAMESPACES } from "@/lib/i18n/browser";
import { clientReadings, namespacesReadBy, ROOT, routeFiles } from "../helpers/client-graph";


const dir = path.resolve(import.meta.dirname, "../../messages");
type Tree = { [k: string]: string | Tree };

function flatten(tree: Tree, prefix = ""): Map<string, string> {
  const out = new Map<string, string>();
  for (const [k, v] of Object.entries(tree)) {
    const key = prefix ? `${prefix}.${k}` : k;
    if (typeof v === "string") out.set(key, v);
    else for (const [kk, vv] of flatten(v, key)) out.set(kk, vv);
  }
  return out;
}

function catalog(locale: string): Map<string, string> {
  const out = new Map<string, string>();
  for (const f of readdirSync(path.join(dir, locale)).filter((n) => n.endsWith(".json"))) {
    const tree = JSON.parse(readFileSync(path.join(dir, locale, f), "utf8")) as Tree;
    for (const [k, v] of flatten(tree, f.slice(0, -5))) out.set(k, v);
  }
  return out;
}

/** The argument names a message uses, with their kind (plain, number, date, plural, select, tag). */
function argumentsOf(elements: MessageFormatElement[], out = new Set<string>()): Set<string> {
  for (const el of elements) {
    if (el.type === TYPE.argument) out.add(`${el.value}`);
    else if (el.type === TYPE.number || el.type === TYPE.date || el.type === TYPE.time) out.add(`${el.value}:${TYPE[el.type]}`);
    else if (el.type === TYPE.plural || el.type === TYPE.select) {
      out.add(`${el.value}:${TYPE[el.type]}`);
      for (const o of Object.values(el.options)) argumentsOf(o.value, out);
    } else if (el.type === TYPE.tag) {
      out.add(`<${el.value}>`);
      argumentsOf(el.children, out);
    }
  }
  return out;
}

const catalogs = Object.fromEntries(LOCALES.map((l) => [l, catalog(l)]));

describe("message catalogs", () => {
  it("have the same namespaces in every language", () => {
    const files = (l: string) => readdirSync(path.join(dir, l)).filter((n) => n.endsWith(".json")).sort();
    expect(files("es")).toEqual(files("en"));
  });

  it("have the same keys in English and Spanish", () => {
    const en = [...catalogs.en!.keys()].sort();
    const es = [...catalogs.es!.keys()].sort();
    expect(es.filter((k) => !catalogs.en!.has(k)), "keys only in Spanish").toEqual([]);
    expect(en.filter((k) => !catalogs.es!.has(k)), "keys only in English").toEqual([]);
  });

  it("hold valid ICU messages with the same arguments in both languages, none empty", () => {
    const problems: string[] = [];
    for (const [key, en] of catalogs.en!) {
      const es = catalogs.es!.get(key);
      if (es === undefined) continue;
      if (!en.trim() || !es.trim()) problems.push(`${key}: empty`);
      let a: Set<string>, b: Set<string>;
      try {
        a = argumentsOf(parse(en));
        b = argumentsOf(parse(es));
      } catch (err) {
        problems.push(`${key}: not valid ICU (${(err as Error).message})`);
        continue;
      }
      const sa = [...a].sort().join(", ");
      const sb = [...b].sort().join(", ");
      if (sa !== sb) problems.push(`${key}: English uses {${sa}}, Spanish {${sb}}`);
    }
    expect(problems).toEqual([]);
  });
});

describe("Accept-Language negotiation (RFC 9110 §12.5.4)", () => {
  it("takes the highest q-value among Riser's languages, matching on the primary tag", () => {
    expect(negotiateLocale("es-MX,es;q=0.9,en-US;q=0.8,en;q=0.7")).toBe("es");
    expect(negotiateLocale("en-US,en;q=0.9,es;q=0.8")).toBe("en");
    expect(negotiateLocale("fr-CA,fr;q=0.9,es;q=0.5")).toBe("es");
    expect(negotiateLocale("en;q=0.2,es;q=0.9")).toBe("es");
  });
  it("ignores q=0, unknown languages and junk, and falls back to English", () => {
    expect(negotiateLocale("es;q=0,en;q=0.1")).toBe("en");
    expect(negotiateLocale("de,fr")).toBe("en");
    expect(negotiateLocale("")).toBe("en");
    expect(negotiateLocale(null)).toBe("en");
    expect(negotiateLocale(";;,,q=abc")).toBe("en");
  });
});

describe("catalogs sent to the browser", () => {
  // Follows the imports from every route file (and mdx-components.tsx, which lessons and cards use):
  // each useTranslations call in code that runs in the browser must read a namespace carried by the
  // root layout's base set or by a <ScopedMessages> provider around it (tests/helpers/client-graph.ts).
  const entries = [...routeFiles(), path.join(ROOT, "mdx-components.tsx")];
  const { readings, reached } = clientReadings(entries);
  const scoped = SCOPED_NAMESPACES as Record<string, readonly string[]>;

  it("include every namespace a browser component reads, on every route that shows it", () => {
    expect(readings.length).toBeGreaterThan(20);
    const missing = readings
      .filter((r) => !(BASE_NAMESPACES as readonly string[]).includes(r.namespace) && !r.scopes.some((s) => scoped[s]?.includes(r.namespace)))
      .map((r) => `${path.relative(ROOT, r.file)} reads "${r.namespace}" under ${path.relative(ROOT, r.entry)} (scopes: ${r.scopes.join(", ") || "base only"})`);
    expect([...new Set(missing)].sort()).toEqual([]);
  });

  it("name only scopes that exist", () => {
    const unknown = readings.flatMap((r) => r.scopes).filter((s) => !(s in scoped));
    expect([...new Set(unknown)]).toEqual([]);
  });

  it("reach every component that calls useTranslations (so none escapes the check above)", () => {
    const files: string[] = [];
    const walk = (d: string) => {
      for (const e of readdirSync(d, { withFileTypes: true })) {
        const p = path.join(d, e.name);
        if (e.isDirectory()) walk(p);
        else if (/\.tsx?$/.test(e.name) && namespacesReadBy(p).length) files.push(p);
      }
    };
    for (const d of ["app", "components", "lib"]) walk(path.join(ROOT, d));
    expect(files.length).toBeGreaterThan(20);
    expect(files.filter((f) => !reached.has(f)).map((f) => path.relative(ROOT, f))).toEqual([]);
  });

  it("keep the large section catalogs off the pages that do not use them", () => {
    // the reason for the scopes: a lesson page carries neither the team board's nor the admin console's
    // words, and the calculators' only inside an embedded calculator
    for (const heavy of ["team", "adminConsole", "calcReports", "tools", "billing"]) {
      expect(BASE_NAMESPACES as readonly string[]).not.toContain(heavy);
      expect(scoped.lessons).not.toContain(heavy);
    }
  });
});
