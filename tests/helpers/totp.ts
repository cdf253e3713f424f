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
