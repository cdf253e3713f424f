// Who owes a refresher after a material content change (pure rule), and the manager's input rules
// for adopted editions and local notes.
import { describe, expect, it } from "vitest";
import { dueChanges, seedOf, type ChangeFact } from "@/lib/refreshers/due";
import { AMENDMENT_MAX, amendmentSchema, jurisdictionSchema, jurisdictionUpdateSchema } from "@/lib/editions/browser";

const t = (iso: string) => new Date(`${iso}T12:00:00.000Z`);
const change = (id: number, moduleSlug: string, at: string, kind: "lesson" | "question" = "lesson"): ChangeFact => ({
  id,
  moduleSlug,
  kind,
  itemSlug: `item-${id}`,
  revision: 2,
  whatChanged: "Antifreeze limits now shown per edition",
  recordedAt: t(at),
});

describe("dueChanges", () => {
  const changes = [change(1, "freeze-protection", "2026-06-01"), change(2, "freeze-protection", "2026-09-01", "question"), change(3, "pipe-and-joining", "2026-06-01")];

  it("flags exactly the people who completed the module before the change", () => {
    const due = dueChanges(
      [
        { userId: "before", moduleSlug: "freeze-protection", at: t("2026-05-01") },
        { userId: "between", moduleSlug: "freeze-protection", at: t("2026-07-01") },
        { userId: "after", moduleSlug: "freeze-protection", at: t("2026-10-01") },
      ],
      [],
      changes,
    );
    expect(due.get("before|freeze-protection")?.map((c) => c.id)).toEqual([1, 2]);
    expect(due.get("between|freeze-protection")?.map((c) => c.id)).toEqual([2]);
    expect(due.has("after|freeze-protection")).toBe(false);
    expect([...due.keys()].sort()).toEqual(["before|freeze-protection", "between|freeze-protection"]);
  });

  it("never flags someone who has not completed the module, nor for another module's change", () => {
    const due = dueChanges([{ userId: "p", moduleSlug: "freeze-protection", at: t("2026-05-01") }], [], [change(3, "pipe-and-joining", "2026-06-01")]);
    expect(due.size).toBe(0);
  });

  it("a refresher clears the changes recorded before it, not later ones; the latest completion counts", () => {
    const completions = [
      { userId: "p", moduleSlug: "freeze-protection", at: t("2026-04-01") },
      { userId: "p", moduleSlug: "freeze-protection", at: t("2026-05-01") },
    ];
    expect(dueChanges(completions, [{ userId: "p", moduleSlug: "freeze-protection", at: t("2026-07-01") }], changes).get("p|freeze-protection")?.map((c) => c.id)).toEqual([2]);
    expect(dueChanges(completions, [{ userId: "p", moduleSlug: "freeze-protection", at: t("2026-09-02") }], changes).size).toBe(0);
  });

  it("seeds the refresher draw the same way for the same person and changes", () => {
    expect(seedOf("u|m|1,2")).toBe(seedOf("u|m|1,2"));
    expect(seedOf("u|m|1,2")).not.toBe(seedOf("u|m|1,3"));
    // FNV-1a 32-bit of the empty string is its offset basis (Fowler–Noll–Vo reference values)
    expect(seedOf("")).toBe(0x811c9dc5);
    expect(seedOf("a")).toBe(0xe40c292c);
  });
});

describe("manager input", () => {
  it("refuses an unknown edition and names the editions", () => {
    const r = jurisdictionSchema.safeParse({ name: "Brackwater County", state: "OR", edition: 2018, ircP2904: false });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.message).toContain("2013, 2016, 2019, 2022, 2025");
    expect(jurisdictionUpdateSchema.safeParse({}).success).toBe(false);
    expect(jurisdictionSchema.parse({ name: " Brackwater County ", state: "OR", edition: "2016", ircP2904: true })).toMatchObject({ name: "Brackwater County", edition: 2016, isDefault: false });
  });
  it("keeps local notes short, plain and on a known topic", () => {
    expect(amendmentSchema.safeParse({ topic: "freeze", body: "x".repeat(AMENDMENT_MAX + 1) }).success).toBe(false);
    expect(amendmentSchema.safeParse({ topic: "freeze", body: "RPZ on every loop\u0000" }).success).toBe(false);
    expect(amendmentSchema.safeParse({ topic: "roofing", body: "RPZ on every antifreeze loop" }).success).toBe(false);
    expect(amendmentSchema.parse({ topic: "freeze", body: "<b>RPZ</b> on every\nantifreeze loop" }).body).toBe("<b>RPZ</b> on every\nantifreeze loop");
  });
});
