// CSV exports (audit log, "download my records") must not let a cell run as a spreadsheet formula.
// Reference: OWASP, "CSV Injection" — cells beginning with = + - @ tab (0x09) or carriage return
// (0x0D) are prefixed with a single quote. Quoting and line ends per RFC 4180.
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { toSafeCsv } from "@/lib/csv/safe";

const parse = (csv: string) => Papa.parse<string[]>(csv, { skipEmptyLines: true, delimiter: "," }).data;

describe("toSafeCsv", () => {
  it("prefixes every formula-starting cell with a quote (OWASP CSV Injection list)", () => {
    const dangerous = ["=1+1", "+SUM(A1)", "-2+3", "@cmd", "\tTAB", "\rCR", '=HYPERLINK("http://x.invalid","click")'];
    const csv = toSafeCsv(
      dangerous.map((v) => ({ v })),
      ["v"],
    );
    const cells = parse(csv).slice(1).map((r) => r[0]);
    expect(cells).toEqual(dangerous.map((v) => `'${v}`));
  });

  it("also catches a formula followed by a line break (Papa Parse's own escapeFormulae misses it)", () => {
    const csv = toSafeCsv([{ v: "=cmd|' /C calc'!A0\nsecond line" }], ["v"]);
    expect(parse(csv)[1]![0]).toBe("'=cmd|' /C calc'!A0\nsecond line");
    // the check that motivated our own pattern: the library default leaves it alone
    const lib = Papa.unparse([["=x\ny"]], { escapeFormulae: true });
    expect(lib.startsWith('"=x')).toBe(true);
  });

  it("leaves ordinary text, e-mail addresses and dates as they are", () => {
    const row = { a: "Quillmoor Fire Protection", b: "maren@quillmoor.example", c: new Date("2026-12-01T08:30:00Z"), d: 85, e: null };
    const [header, values] = parse(toSafeCsv([row], ["a", "b", "c", "d", "e"]));
    expect(header).toEqual(["a", "b", "c", "d", "e"]);
    expect(values).toEqual(["Quillmoor Fire Protection", "maren@quillmoor.example", "2026-12-01T08:30:00.000Z", "85", ""]);
  });

  it("round-trips any text through a CSV parser, quotes, commas and line breaks included (RFC 4180)", () => {
    fc.assert(
      fc.property(fc.array(fc.string({ maxLength: 30 }), { minLength: 1, maxLength: 5 }), (values) => {
        const row = Object.fromEntries(values.map((v, i) => [`c${i}`, v]));
        const cols = values.map((_, i) => `c${i}`);
        const back = Papa.parse<string[]>(toSafeCsv([row], cols), { newline: "\r\n", delimiter: "," }).data[1] ?? [];
        values.forEach((v, i) => {
          const expected = /^[=+\-@\t\r]/.test(v) ? `'${v}` : v;
          expect(back[i]).toBe(expected);
        });
      }),
      { numRuns: 300 },
    );
  });
});
