/**
 * TOTP codes computed by an independent reference implementation (the `otpauth` npm package,
 * RFC 6238 / RFC 4226), never by the app's own library: the tests prove the app accepts what any
 * authenticator app would show.
 */
import * as OTPAuth from "otpauth";
import { DEMO_ADMIN_TOTP_SECRET, demoByRole } from "../../db/demo";

/** The current code for an `otpauth://` URI as the app's enrolment returns it (what the QR code holds). */
export const codeForUri = (uri: string, timestamp = Date.now()) => OTPAuth.URI.parse(uri).generate({ timestamp });

/** The demo admin's current code (the seed enrols it with the published demo key). */
export const demoAdminCode = (timestamp = Date.now()) =>
  new OTPAuth.TOTP({ secret: OTPAuth.Secret.fromUTF8(DEMO_ADMIN_TOTP_SECRET), digits: 6, period: 30, algorithm: "SHA1" }).generate({ timestamp });

export const isDemoAdmin = (email: string) => email.trim().toLowerCase() === demoByRole("admin").email;

/**
 * Sends a second step with a code that has not signed in yet. The app accepts each code once
 * (RFC 6238 §5.2) and accepts the codes of the step before, the current and the next step, so
 * several sign-ins of one account in a row try those three in turn and, when all were used, wait
 * for the next 30-second step. Any answer other than "already used" is returned as it is.
 */
export async function sendUnusedCode<R extends { status: number; clone(): { json(): Promise<unknown> } }>(
  codeAt: (timestamp: number) => string,
  send: (code: string) => Promise<R>,
): Promise<R> {
  for (let round = 0; round < 3; round++) {
    const step = Math.floor(Date.now() / 30_000);
    for (const s of [step, step + 1, step - 1]) {
      const res = await send(codeAt(s * 30_000 + 1_000));
      if (res.status !== 409) return res;
      const body = (await res.clone().json().catch(() => ({}))) as { code?: string };
      if (body.code !== "TOTP_CODE_ALREADY_USED") return res;
    }
    await new Promise((r) => setTimeout(r, 30_000 - (Date.now() % 30_000) + 200));
  }
  throw new Error("no unused TOTP code within three steps");
}
