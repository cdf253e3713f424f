// Stops and starts the test profile's own services from fault tests. Asynchronous on purpose: a
// blocking child process freezes the event loop, so the HTTP client would not see that the app
// server closed an idle keep-alive connection meanwhile and would send the next request on it
// ("other side closed").
import { execFile } from "node:child_process";
import { promisify } from "node:util";

const run = promisify(execFile);
const profile = process.env.RISER_PROFILE ?? "test";

export type LocalService = "db" | "mail-catcher" | "payments-fake" | "s3-fake";

export async function service(name: LocalService, cmd: "start" | "stop"): Promise<void> {
  // a restarted object store keeps what it stored, as a real one does after an outage
  const keep = name === "s3-fake" && cmd === "start" ? ["--keep-data"] : [];
  await run(process.execPath, [`scripts/${name}.mjs`, cmd, `--profile=${profile}`, ...keep], { timeout: 120_000 });
}
