// SWR options for data the server page already loaded: fallbackData and no fetch on mount for the
// page's own key only (SWR 2 options `fallbackData` and `revalidateOnMount`, swr.vercel.app/docs/api).
import { describe, expect, it } from "vitest";
import { asJson, serverFirst } from "@/components/ui/server-first";

describe("serverFirst", () => {
  const first = { key: "/api/team/board?page=1", data: { rows: [1, 2] } };
  it("gives the page's data and skips the mount fetch for the page's key", () => {
    expect(serverFirst("/api/team/board?page=1", first)).toEqual({ fallbackData: { rows: [1, 2] }, revalidateOnMount: false });
  });
  it("leaves any other key, or no server data, to fetch as usual", () => {
    expect(serverFirst("/api/team/board?page=2", first)).toEqual({});
    expect(serverFirst(null, first)).toEqual({});
    expect(serverFirst("/api/team/board?page=1", undefined)).toEqual({});
  });
  it("asJson gives what the API route would send (dates as ISO strings)", () => {
    expect(asJson({ at: new Date("2026-12-01T08:30:00Z"), n: null })).toEqual({ at: "2026-12-01T08:30:00.000Z", n: null });
  });
});
