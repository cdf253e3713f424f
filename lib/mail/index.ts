import "server-only";
import nodemailer from "nodemailer";
import { db } from "@/db/client";
import { mailLog } from "@/db/schema";
import { env, isLocalInstance } from "@/lib/env";

const local = /^smtp:\/\/(127\.0\.0\.1|localhost)(:|\/|$)/.test(env.SMTP_URL);

// The local catcher's certificate is not trusted: plain SMTP on loopback only (see STACK.md).
const transport = local
  ? nodemailer.createTransport({ url: env.SMTP_URL, ignoreTLS: true } as Parameters<typeof nodemailer.createTransport>[0])
  : nodemailer.createTransport(env.SMTP_URL);

export type Mail = { to: string; subject: string; text: string; kind: string };

/** Sends one message and records it in the outgoing mail log (body kept on a local instance only). */
export async function sendMail(mail: Mail): Promise<{ ok: boolean }> {
  let error: string | null = null;
  try {
    await transport.sendMail({ from: env.MAIL_FROM, to: mail.to, subject: mail.subject, text: mail.text });
  } catch (err) {
    error = err instanceof Error ? err.message : String(err);
    console.error(`[mail] could not send "${mail.subject}" to ${mail.to}: ${error}`);
  }
  await db
    .insert(mailLog)
    .values({
      to: mail.to,
      subject: mail.subject.slice(0, 255),
      kind: mail.kind,
      status: error ? "failed" : "sent",
      error,
      // bodies hold sign-in and reset links: stored only on a local instance (lib/env isLocalInstance)
      body: isLocalInstance(env) ? mail.text : null,
    })
    .catch((err) => console.error("[mail] could not write the mail log", err));
  return { ok: !error };
}
