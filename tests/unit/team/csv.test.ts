// CSV output against spreadsheet formula injection. The rule follows the OWASP "CSV Injection"
// advice: a cell starting with =, +, -, @, tab or carriage return gets a leading single quote.
// Quoting follows RFC 4180 (fields with comma, quote or line break in double quotes, quotes doubled).
import { describe, expect, it } from "vitest";
import { csvCell, csvLine, csvResponse, neutralise } from "@/lib/team/csv";

describe("neutralise", () => {
  it("prefixes every formula trigger and leaves other text alone", () => {
    for (const s of ["=1+2", "+SUM(A1)", "-2+3", "@cmd", "\tx", "\rx"]) expect(neutralise(s)).toBe(`'${s}`);
    for (const s of ["Dario Feltham", "North crew", "2027-03-14", "a=b", " =not first"]) expect(neutralise(s)).toBe(s);
  });
});

describe("csvCell and csvLine", () => {
  it("quotes per RFC 4180 after neutralising", () => {
    expect(csvCell('=HYPERLINK("http://evil.example","x")')).toBe(`"'=HYPERLINK(""http://evil.example"",""x"")"`);
    expect(csvCell("Ostrowe, Maren")).toBe('"Ostrowe, Maren"');
    expect(csvCell("two\nlines")).toBe('"two\nlines"');
    expect(csvCell(null)).toBe("");
    expect(csvCell(-5)).toBe("'-5");
    expect(csvLine(["a", 1, "=x"])).toBe("a,1,'=x\r\n");
  });

  it("streams a header and every chunk", async () => {
    async function* chunks() {
      yield [["=one", "1"]];
      yield [["two", "2"]];
    }
    const res = await csvResponse("t.csv", ["Name", "N"], chunks);
    expect(res.headers.get("content-type")).toContain("text/csv");
    const bytes = new Uint8Array(await res.arrayBuffer());
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]); // UTF-8 byte-order mark for spreadsheets
    expect(new TextDecoder().decode(bytes.slice(3))).toBe("Name,N\r\n'=one,1\r\ntwo,2\r\n");
  });
});
