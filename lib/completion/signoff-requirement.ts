import "server-only";
/**
 * The completion rule of sign-offs: a module that lists `requiredSkills` in its module.yaml
 * completes only when each of those skills has an approved sign-off. Registered with
 * lib/completion (addCompletionRequirement); imports nothing from it, so there is no import cycle.
 */
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { signOff } from "@/db/schema";
import { findModule } from "@/lib/content";

/** What is still missing, as lines a learner can read ("sign-off: Makes a CPVC joint …"). */
export async function missingSignOffs(userId: string, moduleSlug: string): Promise<string[]> {
  const mod = findModule(moduleSlug);
  const required = mod?.meta.requiredSkills ?? [];
  if (!mod || !required.length) return [];
  const approved = await db
    .select({ skillId: signOff.skillId })
    .from(signOff)
    .where(and(eq(signOff.userId, userId), eq(signOff.moduleSlug, moduleSlug), eq(signOff.status, "approved"), inArray(signOff.skillId, required)));
  const done = new Set(approved.map((a) => a.skillId));
  return required.filter((id) => !done.has(id)).map((id) => `sign-off: ${mod.skills.find((s) => s.id === id)?.title ?? id}`);
}
