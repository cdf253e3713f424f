// Signed-out header links and the sign-in page's "e-mail confirmed" notice.
import { describe, expect, it } from "vitest";
import { verifiedNotice } from "@/components/auth/sign-in-form";
import { signedOutLinks } from "@/components/shell/nav-items";

describe("signed-out header", () => {
  it("offers no “Create an account” on an invitation page (the invitation creates the account)", () => {
    expect(signedOutLinks("/invite/abc123").map((l) => l.key)).toEqual(["signIn"]);
    expect(signedOutLinks("/").map((l) => l.key)).toEqual(["signIn", "createAccount"]);
  });
});

describe("sign-in notice", () => {
  it("says the e-mail is confirmed only when the link worked and no error is beside it", () => {
    expect(verifiedNotice("1", null, null)).toBe(true);
    expect(verifiedNotice("1", "INVALID_TOKEN", null)).toBe(false);
    expect(verifiedNotice("1", null, "That e-mail and password do not match an account.")).toBe(false);
    expect(verifiedNotice(null, null, null)).toBe(false);
  });
});
