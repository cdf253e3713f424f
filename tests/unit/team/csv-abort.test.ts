// A streamed CSV export that fails part-way must end in a stream error (the download is aborted
// and the browser reports it), never in a file that simply stops early and looks complete.
import { describe, expect, it } from "vitest";
import { csvResponse } from "@/lib/team/csv";

describe("streamed CSV export", () => {
  it("errors the body when a later chunk fails, after the rows already sent", async () => {
    const res = await csvResponse("x.csv", ["Name"], async function* () {
      yield [["Ada Quill"]];
      yield [["Bo Reyes"]];
      throw new Error("database went away");
    });
    expect(res.status).toBe(200);
    const reader = res.body!.getReader();
    const got: string[] = [];
    const dec = new TextDecoder();
    const outcome = await (async () => {
      for (;;) {
        const { value, done } = await reader.read();
        if (done) return "ended";
        got.push(dec.decode(value));
      }
    })().catch((e: Error) => e);
    expect(outcome).toBeInstanceOf(Error);
    expect((outcome as Error).message).toBe("database went away");
    expect(got.join("")).toContain("Ada Quill");
  });

  it("a failure before the first chunk is an error before any response", async () => {
    await expect(
      csvResponse("x.csv", ["Name"], async function* () {
        throw new Error("no database");
      }),
    ).rejects.toThrow("no database");
  });
});
