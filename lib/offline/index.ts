// The offline area's server face: what a phone stores for a module and the versions to compare.
import "server-only";
import { readFileSync } from "node:fs";
import path from "node:path";
import { loadCatalog } from "@/lib/content";
import { CALCULATOR_IDS } from "@/lib/hydraulics";
import { offlinePlan, type OfflinePlan } from "./plan";

export * from "./names";
export { linkedCards, offlinePlan, type OfflinePlan } from "./plan";

/** The running build's id (pages kept on a phone load this build's scripts); "dev" under next dev. */
function buildId(): string {
  try {
    return readFileSync(path.join(process.cwd(), process.env.NEXT_DIST_DIR || ".next", "BUILD_ID"), "utf8").trim();
  } catch {
    return "dev";
  }
}

let memo: { id: string; plans: Map<string, OfflinePlan> } | null = null;

function plans(): Map<string, OfflinePlan> {
  const id = buildId();
  if (!memo || memo.id !== id || process.env.NODE_ENV === "development") {
    const catalog = loadCatalog();
    const map = new Map<string, OfflinePlan>();
    for (const m of catalog.modules) map.set(m.slug, offlinePlan(catalog, m.slug, id, CALCULATOR_IDS)!);
    memo = { id, plans: map };
  }
  return memo.plans;
}

export function planFor(moduleSlug: string): OfflinePlan | null {
  return plans().get(moduleSlug) ?? null;
}

/** Current version of every module's offline copy, for a phone to find its stale ones. */
export function moduleVersions(): Record<string, string> {
  return Object.fromEntries([...plans()].map(([slug, p]) => [slug, p.version]));
}
