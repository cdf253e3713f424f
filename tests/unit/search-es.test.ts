// Spanish search: Spanish word forms and accents folded, one index per language. References: the
// Snowball Spanish stemmer's published behaviour (plural "-es"/"-s" removed: "rociadores" → "rociador";
// "válvulas" and "valvula" share a stem), and the issue's own examples: "rociadores" finds "rociador",
// "valvula" finds "válvula". The documents are small texts written here, so the test does not depend on
// the translation in content/es.
import { describe, expect, it } from "vitest";
import type { SearchDoc } from "@/lib/search/docs";
import { SearchIndex, stem, tokens } from "@/lib/search/engine";
import { mergeLanguages, searchScope } from "@/lib/search/scope";

const es: SearchDoc[] = [
  { id: "es:card:valve", kind: "card", lang: "es", title: "La válvula de control del sistema", href: "/reference/valve", context: "Ficha", text: "Cierra la válvula solo con permiso de la autoridad competente (AHJ)." },
  { id: "es:lesson:heads", kind: "lesson", lang: "es", title: "Cómo se abre un rociador", href: "/modules/x/heads", context: "Módulo", text: "Cada rociador se abre por el calor; los demás siguen cerrados." },
  { id: "es:term:pipe", kind: "term", lang: "es", title: "Tubería de CPVC", href: "/glossary#cpvc", context: "Glosario", text: "Tubería plástica listada para rociadores residenciales. (CPVC pipe)" },
  { id: "es:lesson:freeze", kind: "lesson", lang: "es", title: "Dónde se congelan las casas", href: "/modules/x/freeze", context: "Módulo", text: "El ático sin aislamiento se congela primero; protege la tubería con anticongelante solo donde la norma lo permite." },
];
const en: SearchDoc[] = [{ id: "card:valve", kind: "card", title: "The system control valve", href: "/reference/valve", context: "Code card", text: "Close the valve only with the AHJ's permission." }];

describe("Spanish word forms and accents", () => {
  const index = new SearchIndex(es, "es");
  const top = (q: string) => index.search(q, 3).map((h) => h.id);

  it("folds plurals and accents to one stem, as the Snowball Spanish stemmer does", () => {
    expect(stem("rociadores", "es")).toBe(stem("rociador", "es"));
    expect(stem("valvula", "es")).toBe(stem("válvula".normalize("NFKD").replace(/[\u0300-\u036f]/g, ""), "es"));
    expect(tokens("Las válvulas", "es")).toEqual(tokens("valvula", "es"));
  });

  it('"rociadores" finds the lesson about a "rociador"', () => {
    expect(top("rociadores")).toContain("es:lesson:heads");
  });

  it('"valvula" (no accent) and "válvulas" (plural) find the card about the "válvula"', () => {
    expect(top("valvula")[0]).toBe("es:card:valve");
    expect(top("válvulas")[0]).toBe("es:card:valve");
  });

  it('"congelan" / "tuberias" / "atico" find their documents; Spanish stop words alone find nothing', () => {
    expect(top("congelan")).toContain("es:lesson:freeze");
    expect(top("tuberias")).toContain("es:term:pipe");
    expect(top("atico")).toContain("es:lesson:freeze");
    expect(index.search("de la los", 3)).toEqual([]);
  });

  it("marks Spanish hits as Spanish and keeps the accents in the snippet", () => {
    const hit = index.search("valvula", 1)[0]!;
    expect(hit.lang).toBe("es");
    expect(hit.snippet.filter((s) => s.hit).map((s) => s.text)).toContain("válvula");
  });

  it("an English index does not answer with Spanish documents (one index per language)", () => {
    const english = new SearchIndex(en, "en");
    expect(english.search("valve", 3).map((h) => [h.id, h.lang])).toEqual([["card:valve", "en"]]);
    expect(index.search("close valve", 3).map((h) => h.id)).not.toContain("card:valve");
  });
});

describe("which languages a request searches", () => {
  it("is the reader's language unless the request names one or asks for both", () => {
    expect([searchScope(null, "es"), searchScope("nonsense", "en"), searchScope("en", "es"), searchScope("all", "es")]).toEqual(["es", "en", "en", "all"]);
  });
  it("both: each language's hits in turn, title matches first", () => {
    const english = new SearchIndex(en, "en").query("valve", 5);
    const spanish = new SearchIndex(es, "es").query("valvula", 5);
    const both = mergeLanguages(english, spanish);
    expect(both.hits.map((h) => h.lang).sort()).toEqual(["en", "es"]);
    expect(both.hits.every((h, i) => i === 0 || !h.titleMatch || both.hits[i - 1]!.titleMatch)).toBe(true);
  });
});
