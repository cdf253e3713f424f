// Callout headings: the kind's label once, whether or not the lesson's title repeats it.
import { describe, expect, it } from "vitest";
import { calloutHeading } from "@/components/lesson/callout";

describe("calloutHeading", () => {
  it("does not double a label the title already starts with", () => {
    expect(calloutHeading("Code note", "Code note: listed for sprinkler use")).toBe("Code note: listed for sprinkler use");
    expect(calloutHeading("Code note", "code note — inspection stages")).toBe("Code note: inspection stages");
  });
  it("adds the label to a plain title and stands alone without one", () => {
    expect(calloutHeading("Field tip", "Read the print line")).toBe("Field tip: Read the print line");
    expect(calloutHeading("Caution", undefined)).toBe("Caution");
    expect(calloutHeading("Caution", "Caution:")).toBe("Caution");
  });
});
