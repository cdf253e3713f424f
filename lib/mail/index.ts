import "server-only";
import { db, type Tx } from "@/db/client";
import { mailOutbox } from "@/db/schema";
import { log } from "@/lib/log";
import { isDuplicateKey, scheduleDelivery } from "./outbox";

/** `key`: optional caller key; a message with a key already queued is not queued again. */
export type Mail = { to: string; subject: string; text: string; kind: string; key?: string };

/**
 * Queues one message in the outbox; a worker delivers it (lib/mail/outbox.ts) with retries, so no
 * request ever waits on SMTP. Pass the transaction of the change that causes the message: the
 * message then exists exactly when that change commits. `ok` means "queued".
 */
export async function sendMail(mail: Mail, tx?: Tx): Promise<{ ok: boolean }> {
  const values = {
    to: mail.to.slice(0, 255),
    subject: mail.subject.replace(/[\r\n]+/g, " ").slice(0, 255),
    kind: mail.kind.slice(0, 40),
    body: mail.text,
    dedupeKey: mail.key ? mail.key.slice(0, 191) : null,
    nextAttemptAt: new Date(),
  };
  try {
    const [r] = await (tx ?? db).insert(mailOutbox).values(values);
    // the request id of this line ties the request to the outbox row the worker later logs
    log().debug({ outboxId: r.insertId, kind: values.kind }, "mail queued");
  } catch (err) {
    if (!(mail.key && isDuplicateKey(err))) throw err; // the same keyed message is already queued
  }
  scheduleDelivery(tx ? 400 : 20);
  return { ok: true };
}
export * from "./outbox";
export * from "./worker";
export * from "./i18n";
