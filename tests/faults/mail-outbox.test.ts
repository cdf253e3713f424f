// Mail never holds up a request: with the SMTP server gone — first refusing connections, then
// accepting them and never answering (the case without timeouts that once hung a submit for
// minutes) — a passing quiz submit answers at once; the certificate mail waits in the outbox and
// arrives once the mail server is back.
import { createServer, type Server, type Socket } from "node:net";
import { and, eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { certificate, mailOutbox } from "@/db/schema";
import { freshIp, postJson, signIn, waitForMail } from "../helpers/http";
import { answersFor, catalog } from "../helpers/quiz";
import { service } from "../helpers/services";
import { TEST_PASSWORD, createOrganization, createPeople, readAndComplete } from "../helpers/fixtures";

const catcher = (cmd: "start" | "stop") => service("mail-catcher", cmd);
const smtpPort = () => Number(new URL(process.env.SMTP_URL ?? "smtp://127.0.0.1:2535").port);
const MODULE = "talking-with-homebuyers";

/** Accepts SMTP connections and never says a word. */
function silentServer(port: number): Promise<{ server: Server; sockets: Set<Socket> }> {
  const sockets = new Set<Socket>();
  const server = createServer((s) => {
    sockets.add(s);
    s.on("close", () => sockets.delete(s));
    s.on("error", () => {});
  });
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve({ server, sockets }));
  });
}

let silent: { server: Server; sockets: Set<Socket> } | null = null;
afterAll(async () => {
  if (silent) {
    for (const s of silent.sockets) s.destroy();
    await new Promise((r) => silent!.server.close(r));
  }
  await catcher("start");
  await pool.end();
});

describe("mail outage", () => {
  it("a passing submit answers quickly while SMTP hangs; the certificate mail arrives when mail is back", async () => {
    const org = await createOrganization("Mail Outage Fire Co");
    const [p] = await createPeople(1, { organizationId: org.id, tag: "mail-outage" });
    const client = await signIn(p!.email, TEST_PASSWORD, freshIp());
    const mod = catalog.modules.find((m) => m.slug === MODULE)!;
    await readAndComplete(client, p!.id, MODULE, mod.lessons.map((l) => l.slug));
    const a = await postJson(client, "/api/quiz/attempts", { module: MODULE });
    const id = a.json.id as string;
    const answers = await answersFor(id);

    await catcher("stop");
    silent = await silentServer(smtpPort());
    const t0 = Date.now();
    const res = await postJson(client, `/api/quiz/attempts/${id}/submit`, { answers });
    const elapsed = Date.now() - t0;
    expect(res.status).toBe(200);
    expect(res.json.passed).toBe(true);
    // generous bound for a busy 2-core machine; nodemailer's own greeting timeout alone is 30 s
    expect(elapsed).toBeLessThan(8_000);

    const [cert] = await db.select().from(certificate).where(and(eq(certificate.userId, p!.id), eq(certificate.kind, "module")));
    expect(cert).toBeTruthy();
    const queued = async () => (await db.select().from(mailOutbox).where(and(eq(mailOutbox.to, p!.email), eq(mailOutbox.kind, "certificate.issued"))))[0];
    expect((await queued())?.status).toBe("pending");
    // the worker tried, timed out against the silent server and scheduled a retry
    const until = Date.now() + 45_000;
    while (Date.now() < until && !((await queued())!.tries >= 1)) await new Promise((r) => setTimeout(r, 500));
    const tried = (await queued())!;
    expect(tried.tries).toBeGreaterThanOrEqual(1);
    expect(tried.status).toBe("pending");
    expect(tried.lastError).toBeTruthy();

    for (const s of silent.sockets) s.destroy();
    await new Promise((r) => silent!.server.close(r));
    silent = null;
    await catcher("start");
    const mail = await waitForMail(p!.email, /certificate/i, 60_000);
    expect(mail.text).toContain(cert!.serial);
    const sent = (await queued())!;
    expect(sent.status).toBe("sent");
    // sent once: the outbox row is done and the catcher holds exactly one copy
    await new Promise((r) => setTimeout(r, 3_000));
    const all = await (await fetch(`${process.env.MAIL_CATCHER_URL ?? "http://127.0.0.1:2536"}/messages?to=${encodeURIComponent(p!.email)}`)).json();
    expect((all as { subject: string }[]).filter((m) => /certificate/i.test(m.subject))).toHaveLength(1);
  });
});
