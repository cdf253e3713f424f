// lib/csv, the one CSV writer. Reference for the guard: OWASP, "CSV Injection"
// (owasp.org/www-community/attacks/CSV_Injection): cells beginning with = + - @ tab (0x09) or
// carriage return (0x0D) are prefixed with a single quote so a spreadsheet shows them as text.
// Quoting and line ends: RFC 4180 (CRLF; a field with comma, quote or line break in double quotes,
// its quotes doubled).
import Papa from "papaparse";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { csvDownload, csvLine, csvLines, csvResponse, neutralise, toSafeCsv } from "@/lib/csv";
import { rosterTemplate } from "@/lib/team/roster";

const OWASP_TRIGGERS = ["=", "+", "-", "@", "\t", "\r"];

describe("the formula guard (OWASP CSV Injection)", () => {
  it("neutralises every trigger character the guidance lists, and nothing else at the start", () => {
    for (const t of OWASP_TRIGGERS) expect(neutralise(`${t}1+1`)).toBe(`'${t}1+1`);
    fc.assert(
      fc.property(fc.string({ maxLength: 20 }), (s) => {
        const out = neutralise(s);
        if (s.length > 0 && OWASP_TRIGGERS.includes(s[0]!)) expect(out).toBe(`'${s}`);
        else expect(out).toBe(s);
      }),
      { numRuns: 500 },
    );
  });

  it("guards numbers as text too (a negative number cannot start a formula)", () => {
    expect(csvLine([-5, 3.5, true, null])).toBe("'-5,3.5,true,\r\n");
  });

  it("guards the header line and every streamed chunk", async () => {
    async function* chunks() {
      yield [["@SUM(1+1)", "-1"]];
      yield [["plain", "x\ny"]];
    }
    const res = await csvResponse("board.csv", ["=Name", "N"], chunks);
    const text = (await res.text()).replace(/^\uFEFF/, "");
    expect(text).toBe("'=Name,N\r\n'@SUM(1+1),'-1\r\nplain,\"x\ny\"\r\n");
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
  });

  it("guards the roster template's team names", () => {
    const t = rosterTemplate(["=cmd|' /C calc'!A0"]);
    const rows = Papa.parse<string[]>(t, { skipEmptyLines: true }).data;
    expect(rows[1]![3]).toBe("'=cmd|' /C calc'!A0");
    expect(t.endsWith("\r\n")).toBe(true);
  });
});

describe("writing", () => {
  it("csvLines and toSafeCsv round-trip through a parser with the delimiter pinned to a comma", () => {
    fc.assert(
      fc.property(fc.array(fc.array(fc.string({ maxLength: 12 }), { minLength: 2, maxLength: 2 }), { minLength: 1, maxLength: 4 }), (rows) => {
        const back = Papa.parse<string[]>(csvLines(rows), { delimiter: ",", newline: "\r\n" }).data;
        rows.forEach((r, i) => expect(back[i]).toEqual(r.map(neutralise)));
        const objects = rows.map(([a, b]) => ({ a, b }));
        const parsed = Papa.parse<string[]>(toSafeCsv(objects, ["a", "b"]), { delimiter: ",", newline: "\r\n" }).data;
        expect(parsed[0]).toEqual(["a", "b"]);
        rows.forEach((r, i) => expect(parsed[i + 1]).toEqual(r.map(neutralise)));
      }),
      { numRuns: 300 },
    );
    expect(csvLines([])).toBe("");
  });

  it("a download carries the byte-order mark, a safe file name and extra headers", async () => {
    const res = csvDownload("riser log 2026-12-01.csv", "a\r\n", { "x-riser-truncated": "1" });
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="riser_log_2026-12-01.csv"');
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("x-riser-truncated")).toBe("1");
    expect([...new Uint8Array(await res.arrayBuffer()).slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
  });
});
