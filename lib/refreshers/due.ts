/**
 * Which material changes a person still has to catch up on (pure; unit-tested). A change is due
 * for a person and module when they completed the module before the change was recorded and have
 * not passed a refresher (or completed the module again) since. Nobody who never completed the
 * module is flagged; the certificate stays valid either way.
 */
export type ChangeFact = { id: number; moduleSlug: string; kind: "lesson" | "question"; itemSlug: string; revision: number; whatChanged: string; recordedAt: Date };
export type DoneFact = { userId: string; moduleSlug: string; at: Date };

export function dueChanges(completions: DoneFact[], refreshers: DoneFact[], changes: ChangeFact[]): Map<string, ChangeFact[]> {
  const latest = (facts: DoneFact[]) => {
    const m = new Map<string, Date>();
    for (const f of facts) {
      const k = `${f.userId}|${f.moduleSlug}`;
      const cur = m.get(k);
      if (!cur || f.at > cur) m.set(k, f.at);
    }
    return m;
  };
  const done = latest(completions);
  const refreshed = latest(refreshers);
  const byModule = new Map<string, ChangeFact[]>();
  for (const c of changes) byModule.set(c.moduleSlug, [...(byModule.get(c.moduleSlug) ?? []), c]);
  const out = new Map<string, ChangeFact[]>();
  for (const [key, completedAt] of done) {
    const moduleSlug = key.slice(key.indexOf("|") + 1);
    const since = Math.max(completedAt.getTime(), refreshed.get(key)?.getTime() ?? 0);
    const due = (byModule.get(moduleSlug) ?? []).filter((c) => c.recordedAt.getTime() > since);
    if (due.length) out.set(key, due.sort((a, b) => a.recordedAt.getTime() - b.recordedAt.getTime() || a.id - b.id));
  }
  return out;
}

/** A 32-bit seed from a string (FNV-1a): the same person, module and changes draw the same refresher. */
export function seedOf(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h >>> 0;
}
