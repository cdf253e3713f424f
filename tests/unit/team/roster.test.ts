// Roster CSV checks (lib/team/roster.ts): file-level refusals and one message per kind of bad row.
// Encoding facts: "ë" is the single byte 0xEB in Windows-1252/Latin-1, which is not valid UTF-8
// on its own (RFC 3629); an .xlsx workbook is a ZIP archive and starts with "PK" (0x50 0x4B).
import { describe, expect, it } from "vitest";
import { createTranslator } from "use-intl/core";
import esTeam from "@/messages/es/team.json";
import { checkRoster, decodeRoster, parseRoster, rosterTemplate, type RosterContext } from "@/lib/team/roster";

const enc = (s: string) => new TextEncoder().encode(s);

describe("decodeRoster", () => {
  it("refuses invalid UTF-8, workbooks, other files, empty and oversized files with a plain reason", () => {
    const latin1 = Uint8Array.from([...enc("email,name\nzo"), 0xeb, ...enc("@x.example,Zo\n")]);
    expect(decodeRoster(latin1, "r.csv")).toMatchObject({ error: expect.stringMatching(/not UTF-8/) });
    expect(decodeRoster(Uint8Array.from([0x50, 0x4b, 3, 4, 0, 0]), "roster.csv")).toMatchObject({ error: expect.stringMatching(/not a CSV/) });
    expect(decodeRoster(enc("a,b"), "roster.pdf")).toMatchObject({ error: expect.stringMatching(/\.csv/) });
    expect(decodeRoster(new Uint8Array(0), "r.csv")).toMatchObject({ error: expect.stringMatching(/empty/) });
    expect(decodeRoster(new Uint8Array(1024 * 1024 + 1), "r.csv")).toMatchObject({ error: expect.stringMatching(/limit is 1 MB/) });
    expect(decodeRoster(Uint8Array.from([0xff, 0xfe, 0x65, 0]), "r.csv")).toMatchObject({ error: expect.stringMatching(/UTF-16/) });
  });

  it("accepts UTF-8 with or without a byte-order mark", () => {
    expect(decodeRoster(enc("\uFEFFemail\nzoë@x.example\n"), "r.csv")).toEqual({ text: "email\nzoë@x.example\n" });
  });
});

describe("whole-file problems in the reader's language", () => {
  // Every whole-file refusal carries its team-catalog key; the Spanish catalog has the same key with
  // the same placeholders, and numbers are written the Spanish way (CLDR es: "." groups thousands).
  const es = createTranslator({ locale: "es", messages: { team: esTeam }, namespace: "team" }) as unknown as (k: string, v: Record<string, string | number>) => string;
  const problems = [
    decodeRoster(new Uint8Array(0), "r.csv"),
    decodeRoster(new Uint8Array(1024 * 1024 + 1), "r.csv"),
    decodeRoster(Uint8Array.from([0x50, 0x4b, 3, 4]), "r.csv"),
    decodeRoster(enc("a"), "r.pdf"),
    decodeRoster(Uint8Array.from([0xff, 0xfe, 0x65, 0]), "r.csv"),
    decodeRoster(Uint8Array.from([0x61, 0xeb, 0x0a]), "r.csv"),
    decodeRoster(enc("a\u0000b"), "r.csv"),
    parseRoster("name\nA\n"),
    parseRoster("email\n\n"),
    parseRoster(`email\n${Array.from({ length: 2001 }, (_, i) => `p${i}@x.example`).join("\n")}\n`),
  ];

  it("names ten distinct problems, each with a key in both catalogs", () => {
    const keys = problems.map((p) => ("message" in p ? p.message.key : "none"));
    expect(new Set(keys).size).toBe(10);
    for (const p of problems) {
      if (!("message" in p)) throw new Error("expected a problem");
      const text = es(p.message.key, p.message.values);
      expect(text, p.message.key).not.toBe(p.error);
      expect(text, p.message.key).not.toMatch(/[{}]|bulk\.file/);
    }
  });

  it("formats the row counts for Spanish readers", () => {
    const tooMany = problems[9]!;
    if (!("message" in tooMany)) throw new Error("expected a problem");
    expect(es(tooMany.message.key, tooMany.message.values)).toMatch(/2001 filas; el límite es 2000 por carga/);
    expect(es(tooMany.message.key, { ...tooMany.message.values, count: 12345 })).toMatch(/12\.345 filas/);
  });
});

describe("parseRoster", () => {
  it("needs an email column, keeps file line numbers and skips blank lines", () => {
    expect(parseRoster("name,role\nA,learner\n")).toMatchObject({ error: expect.stringMatching(/email/) });
    const r = parseRoster("Email,Name,Team\r\na@x.example,A,North crew\r\n\r\nb@x.example,\"B, Jr.\",\r\n");
    expect(r).toEqual({
      rows: [
        { line: 2, email: "a@x.example", name: "A", role: "", team: "North crew" },
        { line: 4, email: "b@x.example", name: "B, Jr.", role: "", team: "" },
      ],
    });
  });

  it("states the 2,000-row limit", () => {
    const text = `email\n${Array.from({ length: 2001 }, (_, i) => `p${i}@x.example`).join("\n")}\n`;
    expect(parseRoster(text)).toMatchObject({ error: expect.stringMatching(/2,001 rows; the limit is 2,000/) });
  });
});

describe("checkRoster", () => {
  const ctx: RosterContext = {
    orgName: "Quillmoor Fire Protection",
    teams: new Map([["north crew", { id: "t1", name: "North crew" }]]),
    members: new Set(["member@x.example"]),
    pending: new Set(["pending@x.example"]),
    seats: 5,
    used: 4, // one seat free
  };
  it("names every kind of problem on its row", () => {
    const rows = checkRoster(
      [
        { line: 2, email: "ok@x.example", name: "Ok", role: "", team: "north crew" },
        { line: 3, email: "nope", name: "", role: "learner", team: "" },
        { line: 4, email: "r@x.example", name: "", role: "boss", team: "" },
        { line: 5, email: "t@x.example", name: "", role: "", team: "Attic crew" },
        { line: 6, email: "OK@x.example", name: "", role: "", team: "" },
        { line: 7, email: "member@x.example", name: "", role: "", team: "" },
        { line: 8, email: "other@x.example", name: "", role: "", team: "" },
        { line: 9, email: "", name: "No mail", role: "", team: "" },
        { line: 10, email: "pending@x.example", name: "", role: "sales", team: "" },
        { line: 11, email: "late@x.example", name: "", role: "", team: "" },
      ],
      ctx,
    );
    const by = Object.fromEntries(rows.map((r) => [r.line, r.problems.join(" | ")]));
    expect(by[2]).toBe("");
    expect(rows[0]).toMatchObject({ roleValue: "learner", teamId: "t1" });
    expect(by[3]).toMatch(/^Bad e-mail address/);
    expect(by[4]).toMatch(/^Unknown role “boss”/);
    expect(by[5]).toMatch(/^Unknown team “Attic crew”: teams are North crew/);
    expect(by[6]).toBe("Duplicate in file: the same e-mail is on line 2");
    expect(by[7]).toBe("Already a member of Quillmoor Fire Protection: nothing will be sent");
    // An address with an account in another organization is answered exactly like an unknown one
    // (here: over the seat count, like the unknown address on line 11), so a preview cannot probe
    // other organizations.
    expect(by[8]).toBe(by[11]);
    expect(by[8]).not.toMatch(/account|another organization/i);
    expect(by[9]).toBe("E-mail is missing");
    expect(by[10]).toBe(""); // re-sends an open invitation: no new seat
    expect(rows[8]!.notes[0]).toMatch(/open invitation/);
    expect(by[11]).toMatch(/^Over the seat count: your organization has 5 seats/);
  });
});

it("the template names the columns and uses the organization's teams", () => {
  const t = rosterTemplate(["Rough-in crew", "Trim, finish"]);
  const parsed = parseRoster(t);
  expect("rows" in parsed && parsed.rows.map((r) => r.team)).toEqual(["Rough-in crew", "Trim, finish"]);
});

it("the template for a company without teams imports as it is (team left empty)", () => {
  const t = rosterTemplate([]);
  const parsed = parseRoster(t);
  expect("rows" in parsed && parsed.rows.map((r) => r.team)).toEqual(["", ""]);
  const rows = checkRoster("rows" in parsed ? parsed.rows : [], { orgName: "New Co", teams: new Map(), members: new Set(), pending: new Set(), seats: 3, used: 1 });
  expect(rows.map((r) => r.problems)).toEqual([[], []]);
});
