// The server's PDF summary loads back with pdf-lib: one US Letter page, titled for the calculator,
// dated as asked, and refusing bad input with the field named.
import { describe, expect, it } from "vitest";
import { PDFDocument } from "pdf-lib";
import { CALCULATOR_IDS, CALCULATOR_INFO, HydraulicsInputError, INPUT_CAPS, calculatorReport, inputFromPreset } from "../../../lib/hydraulics";
import { calculatorSummaryPdf, summaryPdfResponse } from "../../../lib/tools/summary-pdf";

const date = new Date("2026-11-20T15:30:00Z");

describe("calculatorSummaryPdf", () => {
  it.each(CALCULATOR_IDS)("%s: one page, titled and dated", async (id) => {
    const bytes = await calculatorSummaryPdf(id, inputFromPreset(id), { date });
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe("%PDF-");
    const doc = await PDFDocument.load(bytes);
    expect(doc.getPageCount()).toBe(1);
    const { width, height } = doc.getPage(0).getSize();
    expect([width, height]).toEqual([612, 792]);
    expect(doc.getTitle()).toContain(CALCULATOR_INFO[id].title);
    expect(doc.getCreator()).toBe("Riser");
    expect(doc.getCreationDate()?.toISOString()).toBe(date.toISOString());
  });

  it("works in SI units too", async () => {
    const bytes = await calculatorSummaryPdf("flow-test", { units: "si", staticPressure: 4.5, residualPressure: 3.3, testFlow: 3200, demandFlow: 100, demandPressure: 3 }, { date });
    expect((await PDFDocument.load(bytes)).getPageCount()).toBe(1);
  });

  it("rejects bad input naming the field", async () => {
    await expect(calculatorSummaryPdf("elevation", { units: "us", height: -4 })).rejects.toThrowError(HydraulicsInputError);
    await expect(calculatorSummaryPdf("elevation", { units: "us", height: -4 })).rejects.toMatchObject({ field: "height" });
    await expect(calculatorSummaryPdf("nope", {})).rejects.toMatchObject({ field: "id" });
  });
});

describe("summaryPdfResponse (route handler body)", () => {
  const post = (body: unknown) =>
    new Request("http://localhost/api/tools/summary", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });

  it("returns application/pdf as an attachment", async () => {
    const res = await summaryPdfResponse(post({ id: "stored-water", input: { units: "us", flow: 26, duration: 10 } }));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toContain("riser-stored-water-summary.pdf");
    const doc = await PDFDocument.load(new Uint8Array(await res.arrayBuffer()));
    expect(doc.getPageCount()).toBe(1);
  });
  it("returns 400 with the field for bad input", async () => {
    const res = await summaryPdfResponse(post({ id: "stored-water", input: { units: "us", flow: 0, duration: 10 } }));
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject({ field: "flow" });
  });
  it("returns 400 with a message for oversized input: more than 50 pipe runs, a label over 80 characters, number text over 32 characters", async () => {
    const base = inputFromPreset("system-demand");
    const run = base.segments[0]!;
    const tooMany = await summaryPdfResponse(post({ id: "system-demand", input: { ...base, segments: Array.from({ length: 51 }, () => run) } }));
    expect(tooMany.status).toBe(400);
    expect(await tooMany.json()).toMatchObject({ field: "segments", error: expect.stringMatching(/50 pipe runs/) });
    const longLabel = await summaryPdfResponse(post({ id: "system-demand", input: { ...base, segments: [{ ...run, label: "x".repeat(81) }] } }));
    expect(longLabel.status).toBe(400);
    expect(await longLabel.json()).toMatchObject({ field: "segments[0].label", error: expect.stringMatching(/80 characters/) });
    const longNumber = await summaryPdfResponse(post({ id: "stored-water", input: { units: "us", flow: "1".repeat(40), duration: 10 } }));
    expect(longNumber.status).toBe(400);
    expect(await longNumber.json()).toMatchObject({ field: "flow" });
    const threeHeads = await summaryPdfResponse(post({ id: "system-demand", input: { ...base, sprinklers: [...base.sprinklers, base.sprinklers[0]] } }));
    expect(threeHeads.status).toBe(400);
    expect(await threeHeads.json()).toMatchObject({ field: "sprinklers" });
  });
  it("accepts exactly 50 pipe runs (the cap, INPUT_CAPS.pipeRuns)", () => {
    const base = inputFromPreset("system-demand");
    const run = { ...base.segments[0]!, length: 2, elevation: 0, elbows: 0 };
    expect(INPUT_CAPS.pipeRuns).toBe(50);
    const r = calculatorReport("system-demand", { ...base, segments: Array.from({ length: 50 }, () => run) });
    expect(r.steps.filter((s) => s.label.startsWith("Water service")).length).toBe(50);
  });
  it("returns 400 for an unknown calculator or a body that is not JSON", async () => {
    expect((await summaryPdfResponse(post({ id: "x", input: {} }))).status).toBe(400);
    const notJson = new Request("http://localhost/api/tools/summary", { method: "POST", body: "not json" });
    expect((await summaryPdfResponse(notJson)).status).toBe(400);
  });
});
