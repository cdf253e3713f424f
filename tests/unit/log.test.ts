// Logs name people by id only: what the redaction paths and the e-mail mask of lib/log let through,
// checked on the JSON lines a logger writes (a capture stream instead of stdout).
import { describe, expect, it } from "vitest";
import { addLogBindings, createLogger, currentRequestId, log, maskEmails, withLogContext } from "@/lib/log";

function capture() {
  const lines: string[] = [];
  const destination = { write: (s: string) => void lines.push(s) };
  return { logger: createLogger({ format: "json", level: "debug", destination }), lines, json: () => lines.map((l) => JSON.parse(l) as Record<string, unknown>) };
}

const EMAIL = "odalys.brenner@fernway-sprinkler.example";
const NAME = "Odalys Brenner";
const TOKEN = "tok_4f9c2a7e1b8d3f60";
const PASSWORD = "correct-horse-riser-2026";

describe("lib/log", () => {
  it("keeps ids and drops names, e-mail addresses, tokens, passwords and cookies wherever they appear", () => {
    const { logger, lines, json } = capture();
    logger.info({ personId: "u-1", organizationId: "o-1", email: EMAIL, name: NAME, password: PASSWORD, token: TOKEN }, "signed in");
    logger.info({ user: { id: "u-1", email: EMAIL, name: NAME }, headers: { cookie: `better-auth.session_token=${TOKEN}`, authorization: `Bearer ${TOKEN}` } }, "nested");
    logger.warn({ mail: { to: EMAIL, outboxId: 7 }, certificate: { holderName: NAME, verificationCode: TOKEN } }, "mail");
    logger.error({ err: new Error(`550 mailbox ${EMAIL} unavailable`) }, `delivery to ${EMAIL} failed`);
    const all = lines.join("");
    for (const secret of [EMAIL, NAME, TOKEN, PASSWORD]) expect(all).not.toContain(secret);
    const [first, second] = json();
    expect(first).toMatchObject({ personId: "u-1", organizationId: "o-1", level: "info", msg: "signed in", service: "riser" });
    expect((second!.user as Record<string, unknown>).id).toBe("u-1");
    expect(all).toContain("[email]");
    expect(all).toContain("[redacted]");
  });

  it("masks addresses in free text", () => {
    expect(maskEmails(`to ${EMAIL}, cc a.b+c@x.example`)).toBe("to [email], cc [email]");
    expect(maskEmails("no address @ here")).toBe("no address @ here");
  });

  it("child loggers carry the request id and the person's ids on every line", () => {
    const { logger, json } = capture();
    const child = logger.child({ requestId: "req-123456" }).child({ personId: "u-9", organizationId: "o-9" });
    child.info({ status: 200 }, "request");
    expect(json()[0]).toMatchObject({ requestId: "req-123456", personId: "u-9", organizationId: "o-9", status: 200, msg: "request" });
  });

  it("a log context follows the work across awaits and ends with it", async () => {
    await withLogContext({ requestId: "req-abcdef12" }, async () => {
      await new Promise((r) => setTimeout(r, 5));
      addLogBindings({ personId: "u-2", organizationId: null });
      await withLogContext({ job: "mail-outbox" }, async () => {
        expect(log().bindings()).toMatchObject({ requestId: "req-abcdef12", personId: "u-2", job: "mail-outbox" });
        expect(currentRequestId()).toBe("req-abcdef12");
      });
    });
    expect(log().bindings().requestId).toBeUndefined();
    expect(currentRequestId()).toBeUndefined();
  });
});
