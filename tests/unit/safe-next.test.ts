// After sign-in only same-origin paths are followed. The attack strings are the classic open-redirect
// forms: backslash and tab tricks that browsers normalise into "//host" (WHATWG URL Standard, "special
// authority ignore slashes state" and the removal of ASCII tab or newline from input).
import { describe, expect, it } from "vitest";
import { safeNext } from "@/lib/safe-next";

const ORIGIN = "http://127.0.0.1:3100";

describe("safeNext", () => {
  it("keeps same-origin paths with their query", () => {
    expect(safeNext("/modules/freeze-protection?tab=quiz", ORIGIN)).toBe("/modules/freeze-protection?tab=quiz");
    expect(safeNext("/team", ORIGIN)).toBe("/team");
    expect(safeNext(`${ORIGIN}/account`, ORIGIN)).toBe("/account");
  });

  it("drops the fragment and falls back on nothing", () => {
    expect(safeNext("/learn#top", ORIGIN)).toBe("/learn");
    expect(safeNext(null, ORIGIN)).toBe("/learn");
    expect(safeNext("", ORIGIN, "/home")).toBe("/home");
  });

  it.each([
    "/\\evil.example", // ?next=/%5Cevil.example, decoded
    "/\t/evil.example", // ?next=/%09/evil.example, decoded
    "/\n/evil.example",
    "//evil.example",
    "\\\\evil.example",
    "https://evil.example/learn",
    "http://127.0.0.1:3101/learn",
    "javascript:alert(1)",
    "/.//evil.example",
    " //evil.example",
  ])("refuses %j", (next) => {
    const out = safeNext(next, ORIGIN);
    expect(out).toBe("/learn");
    expect(new URL(out, ORIGIN).origin).toBe(ORIGIN);
  });
});
