// English plural forms from Intl.PluralRules ("one" only for exactly 1; CLDR plural rules for "en").
import { describe, expect, it } from "vitest";
import { plural } from "@/lib/plural";

describe("plural", () => {
  it("uses the singular for exactly one and the plural otherwise", () => {
    expect(plural(1, "member")).toBe("1 member");
    expect(plural(2, "member")).toBe("2 members");
    expect(plural(0, "result")).toBe("0 results");
    expect(plural(1, "open invitation")).toBe("1 open invitation");
    expect(plural(3, "open invitation")).toBe("3 open invitations");
    expect(plural(1, "row")).toBe("1 row");
    expect(plural(1200, "row")).toBe("1,200 rows");
  });
  it("handles the nouns Riser counts that are not regular, and fractions", () => {
    expect(plural(1, "CE hour")).toBe("1 CE hour");
    expect(plural(1.5, "CE hour")).toBe("1.5 CE hours");
    expect(plural(2, "person")).toBe("2 people");
    expect(plural(2, "match")).toBe("2 matches");
  });
});
