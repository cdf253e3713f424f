// The public home page under load (anonymous, no session): requests per second and latency with
// autocannon, 10 connections for 15 s after a 3 s warm-up. Used to measure what rendering public
// pages per request (a fresh CSP nonce in every response) costs against prerendered HTML.
// autocannon ships no types; the one call used here is typed below
// @ts-expect-error -- no declaration file
import autocannonUntyped from "autocannon";
import { APP, record } from "./lib";

const autocannon = autocannonUntyped as (opts: Record<string, unknown>) => Promise<unknown>;
const run = (duration: number) =>
  autocannon({ url: `${APP}/`, connections: 10, duration, headers: { accept: "text/html" } }) as unknown as Promise<{
    requests: { average: number };
    latency: { p50: number; p97_5: number; p99: number };
    non2xx: number;
  }>;

await run(3);
const r = await run(15);
record("home-page", { connections: 10, seconds: 15, requestsPerSecond: r.requests.average, latencyMs: { p50: r.latency.p50, p97_5: r.latency.p97_5, p99: r.latency.p99 }, non2xx: r.non2xx });
