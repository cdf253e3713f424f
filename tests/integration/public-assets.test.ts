// Riser's own icon is served at /favicon.ico (browsers ask for it on every site).
import { describe, expect, it } from "vitest";
import { anonymous } from "../helpers/http";

describe("/favicon.ico", () => {
  it("is an icon, not a 404", async () => {
    const res = await anonymous().fetch("/favicon.ico");
    expect(res.status).toBe(200);
    const bytes = new Uint8Array(await res.arrayBuffer());
    // ICO header: reserved 0, type 1 (icon), then the image count (Microsoft ICO file format).
    expect([...bytes.slice(0, 4)]).toEqual([0, 0, 1, 0]);
    expect(bytes[4]).toBeGreaterThanOrEqual(1);
  });
});
