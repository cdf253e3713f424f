import "server-only";
/** The instance's key ring, from CREDENTIAL_SIGNING_KEY and CREDENTIAL_RETIRED_KEYS (see ./keyring). */
import { env, parseRetiredKeys } from "@/lib/env";
import { DomainError } from "@/lib/errors";
import { buildKeyRing, type KeyRing } from "./keyring";

let cached: Promise<KeyRing> | null = null;
/** The instance's ring; 503 when no signing key is configured (only possible on a local instance). */
export function keyRing(): Promise<KeyRing> {
  if (!env.CREDENTIAL_SIGNING_KEY) {
    return Promise.reject(new DomainError("unavailable", "Portable credentials are not set up on this instance: CREDENTIAL_SIGNING_KEY is missing."));
  }
  const retired = parseRetiredKeys(env.CREDENTIAL_RETIRED_KEYS);
  cached ??= buildKeyRing(env.CREDENTIAL_SIGNING_KEY, "keys" in retired ? (retired.keys as { x: string; kid?: unknown }[]) : [], env.APP_URL);
  return cached;
}

