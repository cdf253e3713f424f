// Roster-import row problems for a Spanish-speaking manager. Outside references: the English
// problem texts the preview has always shown (tests/unit/team/roster.test.ts checks them) and the
// Spanish team catalog as written in messages/es/team.json; names, e-mails, line numbers and seat
// counts come through unchanged.
import { describe, expect, it } from "vitest";
import { checkRoster, type RosterContext } from "@/lib/team/roster";
import { rosterRowText } from "@/lib/team/browser";
import { catalogTranslator } from "@/lib/i18n/translator";

const ctx: RosterContext = {
  orgName: "Quillmoor Fire Protection",
  teams: new Map([["north crew", { id: "t1", name: "North crew" }]]),
  members: new Set(["member@x.example"]),
  pending: new Set(["pending@x.example"]),
  seats: 5,
  used: 4,
};
const rows = checkRoster(
  [
    { line: 2, email: "ok@x.example", name: "Ok", role: "", team: "north crew" },
    { line: 3, email: "nope", name: "", role: "learner", team: "" },
    { line: 4, email: "r@x.example", name: "", role: "boss", team: "" },
    { line: 5, email: "t@x.example", name: "", role: "", team: "Attic crew" },
    { line: 6, email: "OK@x.example", name: "", role: "", team: "" },
    { line: 7, email: "member@x.example", name: "", role: "", team: "" },
    { line: 9, email: "", name: "x".repeat(201), role: "", team: "" },
    { line: 10, email: "pending@x.example", name: "", role: "sales", team: "" },
    { line: 11, email: "late@x.example", name: "", role: "", team: "" },
  ],
  ctx,
);
const t = (lang: string) => catalogTranslator(lang, "team") as (key: string, values: Record<string, string>) => string;
const shown = (lang: string) => Object.fromEntries(rows.map((r) => [r.line, rosterRowText(r.problemMessages, r.problems, t(lang)).join(" | ")]));

describe("roster row problems in the manager's language", () => {
  it("English from the catalog is exactly the text the preview has always carried", () => {
    const en = shown("en");
    for (const r of rows) expect(en[r.line]).toBe(r.problems.join(" | "));
    const pending = rows.find((r) => r.line === 10)!;
    expect(rosterRowText(pending.noteMessages, pending.notes, t("en"))).toEqual(pending.notes);
  });

  it("a Spanish reader gets every problem in Spanish, with the file's own values unchanged", () => {
    const es = shown("es");
    expect(es[2]).toBe("");
    expect(es[3]).toBe("Correo electrónico no válido: “nope”");
    expect(es[4]).toBe("Rol desconocido “boss”: usa learner, sales o manager");
    expect(es[5]).toBe("Equipo desconocido “Attic crew”: los equipos son North crew");
    expect(es[6]).toBe("Repetido en el archivo: el mismo correo está en la línea 2");
    expect(es[7]).toBe("Ya es miembro de Quillmoor Fire Protection: no se enviará nada");
    expect(es[9]).toBe("Falta el correo electrónico | El nombre tiene más de 200 caracteres");
    expect(es[11]).toBe("Excede los asientos: tu organización tiene 5 asientos y todos están ocupados; compra más en la página de facturación");
    const pending = rows.find((r) => r.line === 10)!;
    expect(rosterRowText(pending.noteMessages, pending.notes, t("es"))).toEqual(["Tiene una invitación abierta: un enlace nuevo la reemplaza (sin asiento adicional)"]);
  });

  it("falls back to the English text when a row came without keys", () => {
    expect(rosterRowText(undefined, ["E-mail is missing"], t("es"))).toEqual(["E-mail is missing"]);
  });
});
