/**
 * Structured logs (pino): one JSON object per line on a hosted instance, pino-pretty on a local
 * profile (RISER_LOCAL=1); LOG_FORMAT=json|pretty and LOG_LEVEL (info) override. Request handlers
 * (lib/api route()), jobs and the mail worker run inside a log context, so every line they write
 * carries the request id (from proxy.ts), the job run, and the person and organization ids.
 *
 * People are named by id only: names, e-mail addresses, tokens, passwords, cookies and
 * authorization headers are redacted by key, and any e-mail address left in a message or an error
 * text is masked as the line is written (tests/unit/log.test.ts).
 * Reads process.env directly, not lib/env: it must work while the environment check is failing.
 * No server-only import: scripts (seeds, jobs) log through it too.
 */
import { AsyncLocalStorage } from "node:async_hooks";
import pino, { type DestinationStream, type Logger } from "pino";
import pretty from "pino-pretty";

export type { Logger } from "pino";

/** Keys whose values never reach a log line, at any depth pino's redaction reaches (two levels). */
const SECRET_KEYS = ["email", "to", "name", "holderName", "password", "token", "secret", "cookie", "authorization", "otp", "verificationCode"];
export const REDACT_PATHS = [
  ...SECRET_KEYS,
  ...SECRET_KEYS.map((k) => `*.${k}`),
  ...SECRET_KEYS.map((k) => `*.*.${k}`),
  'req.headers["x-jobs-secret"]',
  'headers["x-jobs-secret"]',
  "headers.cookie",
  "headers.authorization",
];

const EMAIL = /[A-Za-z0-9._%+-]+@[A-Za-z0-9.-]+\.[A-Za-z]{2,}/g;

/** Masks e-mail addresses that slipped into free text (error messages, SMTP replies). */
export function maskEmails(line: string): string {
  return line.replace(EMAIL, "[email]");
}

export type LogOptions = { level?: string; format?: "json" | "pretty"; destination?: DestinationStream };

/** A logger with Riser's redaction; tests pass their own destination to read what is written. */
export function createLogger(opts: LogOptions = {}): Logger {
  const format = opts.format ?? (process.env.LOG_FORMAT === "json" || process.env.LOG_FORMAT === "pretty" ? process.env.LOG_FORMAT : process.env.RISER_LOCAL === "1" ? "pretty" : "json");
  const destination =
    opts.destination ?? (format === "pretty" ? pretty({ colorize: Boolean(process.stdout.isTTY), sync: true, singleLine: true, errorLikeObjectKeys: ["err"], ignore: "pid,hostname,service", translateTime: "SYS:HH:MM:ss.l" }) : pino.destination({ sync: true }));
  return pino(
    {
      level: opts.level ?? process.env.LOG_LEVEL ?? "info",
      base: { service: "riser" },
      timestamp: pino.stdTimeFunctions.isoTime,
      redact: { paths: REDACT_PATHS, censor: "[redacted]" },
      serializers: { err: pino.stdSerializers.err, error: pino.stdSerializers.err },
      hooks: { streamWrite: maskEmails },
      formatters: { level: (label) => ({ level: label }) },
    },
    destination,
  );
}

type Context = { log: Logger; requestId?: string };
const state = globalThis as unknown as { riserLog?: { root: Logger; als: AsyncLocalStorage<Context> } };
state.riserLog ??= { root: createLogger(), als: new AsyncLocalStorage<Context>() };
const { als } = state.riserLog;

/** The logger of the current request, job run or mail delivery (the root logger outside one). */
export function log(): Logger {
  return als.getStore()?.log ?? state.riserLog!.root;
}

/** The request id of the current context, if any. */
export function currentRequestId(): string | undefined {
  return als.getStore()?.requestId;
}

/** Runs `fn` with a logger that adds `bindings` (ids only) to every line written inside it. */
export function withLogContext<T>(bindings: Record<string, unknown>, fn: () => T): T {
  const parent = als.getStore();
  const child = (parent?.log ?? state.riserLog!.root).child(bindings);
  const requestId = typeof bindings.requestId === "string" ? bindings.requestId : parent?.requestId;
  return als.run({ log: child, requestId }, fn);
}

/** Adds ids learned later (the signed-in person) to the current context's logger. */
export function addLogBindings(bindings: Record<string, unknown>): void {
  const store = als.getStore();
  if (store) store.log = store.log.child(bindings);
}
