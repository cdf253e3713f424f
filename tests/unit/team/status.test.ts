// The board's cell status rule (lib/team/status.ts): one fact pattern per status, and the
// precedence between them. The 30-day "expiring" window is Riser's own choice (EXPIRY_REMINDER_DAYS,
// shared with the certificate reminder); validity months come from content/modules/*/module.yaml.
import { describe, expect, it } from "vitest";
import { cellStatus, countedStatus, expiryOf, NO_FACTS, type CellFacts } from "@/lib/team/status";

const now = new Date("2027-03-15T12:00:00Z");
const days = (n: number) => new Date(now.getTime() + n * 86_400_000);
const f = (patch: Partial<CellFacts>): CellFacts => ({ ...NO_FACTS, ...patch });
const VALIDITY = 24;

describe("cellStatus", () => {
  it("names each status from its facts", () => {
    expect(cellStatus(NO_FACTS, VALIDITY, now)).toBe("not_started");
    expect(cellStatus(f({ lessonsDone: 1 }), VALIDITY, now)).toBe("in_progress");
    expect(cellStatus(f({ attempts: 1 }), VALIDITY, now)).toBe("in_progress"); // an open attempt
    expect(cellStatus(f({ lessonsDone: 4, attempts: 1, lastGradedAt: days(-1) }), VALIDITY, now)).toBe("failed");
    expect(cellStatus(f({ certificates: 1, validUntil: days(200), completedAt: days(-500) }), VALIDITY, now)).toBe("passed");
    expect(cellStatus(f({ certificates: 1, validUntil: days(10) }), VALIDITY, now)).toBe("expiring");
    expect(cellStatus(f({ certificates: 1, validUntil: days(-3) }), VALIDITY, now)).toBe("expired");
    expect(cellStatus(f({ dueAt: days(-1) }), VALIDITY, now)).toBe("overdue");
  });

  it("uses the 30-day window inclusively and counts expiry from its instant", () => {
    expect(cellStatus(f({ certificates: 1, validUntil: days(30) }), VALIDITY, now)).toBe("expiring");
    expect(cellStatus(f({ certificates: 1, validUntil: new Date(days(30).getTime() + 1000) }), VALIDITY, now)).toBe("passed");
    expect(cellStatus(f({ certificates: 1, validUntil: now }), VALIDITY, now)).toBe("expired");
  });

  it("lets a valid certificate win over a past due date, and overdue win over expired and failed", () => {
    expect(cellStatus(f({ certificates: 1, validUntil: days(100), dueAt: days(-5) }), VALIDITY, now)).toBe("passed");
    expect(cellStatus(f({ certificates: 1, validUntil: days(-1), dueAt: days(-5) }), VALIDITY, now)).toBe("overdue");
    expect(cellStatus(f({ lastGradedAt: days(-1), dueAt: days(-5) }), VALIDITY, now)).toBe("overdue");
    expect(cellStatus(f({ lessonsDone: 2, dueAt: days(2) }), VALIDITY, now)).toBe("in_progress"); // due later: not overdue
  });

  it("reads the last graded attempt: a pass after a fail is not 'failed', a fail after a pass is", () => {
    expect(cellStatus(f({ attempts: 2, lastGradedAt: days(-1), lastPassAt: days(-1) }), VALIDITY, now)).toBe("in_progress");
    expect(cellStatus(f({ attempts: 2, lastGradedAt: days(-1), lastPassAt: days(-9) }), VALIDITY, now)).toBe("failed");
  });

  it("counts a completion without certificate rows for the module's validity; a revoked certificate counts as none", () => {
    // completed 23 months and 20 days ago, 24 months valid → about 10 days left
    const completedAt = new Date(Date.UTC(2025, 3, 25, 12));
    expect(expiryOf(f({ completedAt }), VALIDITY)?.toISOString()).toBe("2027-04-25T12:00:00.000Z");
    expect(cellStatus(f({ completedAt: new Date(Date.UTC(2025, 2, 25, 12)) }), VALIDITY, now)).toBe("expiring");
    expect(cellStatus(f({ completedAt: new Date(Date.UTC(2024, 0, 1)) }), VALIDITY, now)).toBe("expired");
    // every certificate revoked: no standing, falls back to the attempts and lessons
    expect(cellStatus(f({ completedAt: days(-20), certificates: 1, validUntil: null, lessonsDone: 4, lastGradedAt: days(-20), lastPassAt: days(-20) }), VALIDITY, now)).toBe("in_progress");
  });
});

// The stored team totals (lib/team/board-counts.ts) evaluate a status from three facts only; it must
// agree with cellStatus on every fact pattern, including each boundary instant (the rule above is
// the reference), or the totals would drift from the board.
describe("countedStatus", () => {
  it("agrees with cellStatus on every combination of expiry, due date and attempts around each boundary", () => {
    const instants = [null, days(-400), days(-1), new Date(now.getTime() - 1), now, new Date(now.getTime() + 1), days(1), days(30), new Date(days(30).getTime() + 1), days(31), days(400)];
    const attempts: Partial<CellFacts>[] = [{}, { lessonsDone: 2 }, { attempts: 1, lastGradedAt: days(-2) }, { attempts: 2, lastGradedAt: days(-2), lastPassAt: days(-2) }, { attempts: 2, lastGradedAt: days(-2), lastPassAt: days(-5) }];
    let compared = 0;
    for (const validUntil of instants)
      for (const dueAt of instants)
        for (const a of attempts)
          for (const revoked of [false, true]) {
            const facts = f({ ...a, dueAt, certificates: validUntil || revoked ? 1 : 0, validUntil: revoked ? null : validUntil, completedAt: validUntil ? days(-500) : null });
            const expires = expiryOf(facts, VALIDITY);
            const failed = facts.lastGradedAt !== null && (facts.lastPassAt === null || facts.lastPassAt < facts.lastGradedAt);
            const full = cellStatus(facts, VALIDITY, now);
            const want = full === "in_progress" || full === "not_started" ? null : full;
            expect({ validUntil, dueAt, a, revoked, s: countedStatus(expires, dueAt, failed, now) }).toEqual({ validUntil, dueAt, a, revoked, s: want });
            compared++;
          }
    expect(compared).toBe(11 * 11 * 5 * 2);
  });
});

