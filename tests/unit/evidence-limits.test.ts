// Upload resource limits: a photo over 40 megapixels is refused from its header, before any decode;
// only a few photos are decoded at once, and a flood beyond the queue is turned away with 503.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { DECODE_QUEUE, DECODE_SLOTS, EvidenceError, MAX_INPUT_PIXELS, decodeLoad, prepareEvidence } from "@/lib/signoffs/evidence";

const png = (width: number, height: number) => sharp({ create: { width, height, channels: 3, background: "#c87533" } }).png({ compressionLevel: 9 }).toBuffer();
const jpeg = (width: number, height: number) =>
  sharp({ create: { width, height, channels: 3, background: "#777777", noise: { type: "gaussian", mean: 128, sigma: 40 } } }).jpeg({ quality: 80 }).toBuffer();

describe("pixel cap", () => {
  it("is about 40 megapixels", () => {
    expect(MAX_INPUT_PIXELS).toBe(40_000_000);
  });

  it("refuses a 48-megapixel photo (8000 × 6000) with 413 and a clear message", async () => {
    const bytes = new Uint8Array(await png(8000, 6000));
    const err = await prepareEvidence("huge.png", bytes).then(
      () => null,
      (e: unknown) => e,
    );
    expect(err).toBeInstanceOf(EvidenceError);
    expect((err as EvidenceError).status).toBe(413);
    expect((err as EvidenceError).message).toMatch(/more than 40 megapixels/);
  }, 60_000);

  it("accepts a 12-megapixel phone photo (4000 × 3000)", async () => {
    const out = await prepareEvidence("phone.png", new Uint8Array(await png(4000, 3000)));
    expect(out.kind).toBe("photo");
  }, 60_000);
});

describe("decode concurrency", () => {
  it(`decodes at most ${DECODE_SLOTS} photos at once and refuses beyond a queue of ${DECODE_QUEUE}`, async () => {
    const bytes = new Uint8Array(await jpeg(800, 600));
    let maxActive = 0;
    const watch = setInterval(() => (maxActive = Math.max(maxActive, decodeLoad().active)), 2);
    const n = DECODE_SLOTS + DECODE_QUEUE + 4;
    const results = await Promise.allSettled(Array.from({ length: n }, (_, i) => prepareEvidence(`p${i}.jpg`, bytes)));
    clearInterval(watch);
    const refused = results.filter((r) => r.status === "rejected").map((r) => (r as PromiseRejectedResult).reason as EvidenceError);
    expect(refused.length).toBe(4);
    for (const e of refused) {
      expect(e).toBeInstanceOf(EvidenceError);
      expect(e.status).toBe(503);
      expect(e.message).toMatch(/busy/);
    }
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(DECODE_SLOTS + DECODE_QUEUE);
    expect(maxActive).toBeGreaterThan(0);
    expect(maxActive).toBeLessThanOrEqual(DECODE_SLOTS);
    expect(decodeLoad()).toEqual({ active: 0, waiting: 0 });
  }, 60_000);
});
