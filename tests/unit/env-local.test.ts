// Local conveniences (mail catcher and /dev/mail, cookies without Secure, the payment fake over http,
// the default address) are refused unless the instance is local: RISER_LOCAL=1 on a loopback APP_URL.
import { describe, expect, it } from "vitest";
import { isLocalInstance, isLoopbackUrl, localOnlyProblems, sessionCacheSeconds } from "@/lib/env/local";

const local = {
  NODE_ENV: "production",
  RISER_LOCAL: "1" as const,
  APP_URL: "http://127.0.0.1:3100",
  MAIL_CATCHER_URL: "http://127.0.0.1:2536",
  INSECURE_COOKIES: "1" as const,
  STRIPE_API_HOST: "127.0.0.1",
  STRIPE_API_PORT: 12121,
  STRIPE_API_PROTOCOL: "http" as const,
};
const variables = (e: Parameters<typeof localOnlyProblems>[0]) => localOnlyProblems(e).map((p) => p.variable).sort();

describe("local-only settings", () => {
  it("a local profile (what scripts/ set) may use all of them", () => {
    expect(localOnlyProblems(local)).toEqual([]);
    expect(isLocalInstance(local)).toBe(true);
  });

  it("without RISER_LOCAL, a production start with them is refused, naming each", () => {
    expect(variables({ ...local, RISER_LOCAL: "0" })).toEqual(["APP_URL", "INSECURE_COOKIES", "MAIL_CATCHER_URL", "STRIPE_API_PROTOCOL"]);
  });

  it("RISER_LOCAL on a public address is itself refused, and unlocks nothing", () => {
    const out = variables({ ...local, APP_URL: "https://training.example.com" });
    expect(out).toEqual(["INSECURE_COOKIES", "MAIL_CATCHER_URL", "RISER_LOCAL", "STRIPE_API_PROTOCOL"]);
    expect(isLocalInstance({ RISER_LOCAL: "1", APP_URL: "https://training.example.com" })).toBe(false);
  });

  it("production needs its own https address, not the default", () => {
    const bare = { NODE_ENV: "production", RISER_LOCAL: "0" as const, INSECURE_COOKIES: "0" as const };
    expect(localOnlyProblems({ ...bare, APP_URL: "http://127.0.0.1:3000" }).map((p) => p.message).join(" ")).toMatch(/public https:\/\/ address/);
    expect(variables({ ...bare, APP_URL: "http://training.example.com" })).toEqual(["APP_URL"]);
    expect(localOnlyProblems({ ...bare, APP_URL: "https://training.example.com" })).toEqual([]);
  });

  it("a shorter session cache (the bound test's setting) is honoured on a local instance only, never above 60 s", () => {
    const hosted = { RISER_LOCAL: "0" as const, APP_URL: "https://training.example.com" };
    expect(sessionCacheSeconds({ ...hosted, SESSION_CACHE_MAX_AGE_S: 2 })).toBe(60);
    expect(sessionCacheSeconds({ ...hosted, RISER_LOCAL: "1", SESSION_CACHE_MAX_AGE_S: 2 })).toBe(60); // RISER_LOCAL off loopback unlocks nothing
    expect(sessionCacheSeconds(hosted)).toBe(60);
    expect(sessionCacheSeconds({ ...local, SESSION_CACHE_MAX_AGE_S: 2 })).toBe(2);
    expect(sessionCacheSeconds({ ...local, SESSION_CACHE_MAX_AGE_S: 600 })).toBe(60);
  });

  it("knows loopback addresses", () => {
    for (const u of ["http://127.0.0.1:3000", "http://localhost:3000", "http://[::1]:3000", "http://127.9.8.7/"]) expect(isLoopbackUrl(u), u).toBe(true);
    for (const u of ["http://10.0.0.5:3000", "https://127.0.0.1.example.com", "http://0.0.0.0:3000", "not a url"]) expect(isLoopbackUrl(u), u).toBe(false);
  });
});
