// CE hours per reporting period: a hand-worked example (figures added up by hand below, hours as in
// content/modules/*/module.yaml style: 1.5, 2, 2.25, 1) and properties over random histories (fast-check).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CALENDAR_YEARS, hoursByPeriod, periodOf, type CountedCertificate, type PeriodSetting } from "@/lib/credentials/period";

const at = (iso: string) => new Date(iso);
const cert = (subjectSlug: string, ceHours: number, issuedAt: string, o: Partial<CountedCertificate> = {}): CountedCertificate => ({
  kind: "module",
  subjectSlug,
  ceHours,
  issuedAt: at(issuedAt),
  status: "valid",
  ...o,
});

// A: freeze 1.5 h on Jun 30 2025 (last day of a July licence period)  B: pipe 2 h on Jul 1 2025 00:00 UTC
// C: freeze 1.5 h Jan 10 2026   D: a path certificate 3.5 h Jan 10 2026 (not counted: its modules count)
// E: hydraulics 2.25 h May 5 2026, revoked (not counted)   F: freeze 1.5 h again Mar 1 2027 (renewal)
// G: testing 1 h Jul 1 2027
const history = [
  cert("freeze", 1.5, "2025-06-30T23:00:00Z", { status: "expired" }),
  cert("pipe", 2, "2025-07-01T00:00:00Z"),
  cert("freeze", 1.5, "2026-01-10T10:00:00Z"),
  cert("builder-path", 3.5, "2026-01-10T10:00:00Z", { kind: "path" }),
  cert("hydraulics", 2.25, "2026-05-05T10:00:00Z", { status: "revoked" }),
  cert("freeze", 1.5, "2027-03-01T10:00:00Z"),
  cert("testing", 1, "2027-07-01T00:00:00Z"),
];

describe("hours by reporting period (hand-worked)", () => {
  it("calendar years: 2025 = A 1.5 + B 2 = 3.5; 2026 = C 1.5 (D path, E revoked) = 1.5; 2027 = F 1.5 + G 1 = 2.5", () => {
    const { totals } = hoursByPeriod(history, CALENDAR_YEARS);
    expect(totals.map((t) => [t.label, t.hours, t.certificates])).toEqual([
      ["2027", 2.5, 2],
      ["2026", 1.5, 1],
      ["2025", 3.5, 2],
    ]);
  });

  it("24-month licence periods from July 2025: Jul 2023–Jun 2025 = A 1.5; Jul 2025–Jun 2027 = B 2 + C 1.5 = 3.5 (F repeats freeze); Jul 2027–Jun 2029 = G 1", () => {
    const july: PeriodSetting = { startYear: 2025, startMonth: 7, lengthMonths: 24 };
    const { totals, counting } = hoursByPeriod(history, july);
    expect(totals.map((t) => [t.label, t.hours])).toEqual([
      ["Jul 2027 – Jun 2029", 1],
      ["Jul 2025 – Jun 2027", 3.5],
      ["Jul 2023 – Jun 2025", 1.5],
    ]);
    expect(history.map((c) => counting.get(c))).toEqual(["counted", "counted", "counted", "path", "revoked", "repeat", "counted"]);
  });

  it("adds hundredths exactly (0.1 + 0.2 is 0.3 here)", () => {
    const { totals } = hoursByPeriod([cert("a", 0.1, "2026-02-01T00:00:00Z"), cert("b", 0.2, "2026-03-01T00:00:00Z")], CALENDAR_YEARS);
    expect(totals[0]!.hours).toBe(0.3);
  });
});

const settingArb = fc.record({ startYear: fc.integer({ min: 1990, max: 2040 }), startMonth: fc.integer({ min: 1, max: 12 }), lengthMonths: fc.constantFrom(6, 12, 24, 36, 48, 60) });
const dateArb = fc.date({ min: new Date("2000-01-01T00:00:00Z"), max: new Date("2060-12-31T23:59:59Z"), noInvalidDate: true });

/**
 * An independent reckoning of the rule README "Portable credentials and training history" states, used
 * as the oracle below: a period is found by counting whole months from the setting's start month (no
 * call into lib/credentials/period.ts); module certificates count by issue date, paths and revoked ones
 * never, a module counted once per period. Totals in hundredths of an hour.
 */
function reckon(certs: CountedCertificate[], s: PeriodSetting): Map<string, { hundredths: number; certificates: number }> {
  const out = new Map<string, { hundredths: number; certificates: number }>();
  const seen = new Set<string>();
  const byDate = [...certs].sort((a, b) => a.issuedAt.getTime() - b.issuedAt.getTime());
  for (const c of byDate) {
    if (c.kind !== "module" || c.status === "revoked") continue;
    const months = (c.issuedAt.getUTCFullYear() - s.startYear) * 12 + c.issuedAt.getUTCMonth() - (s.startMonth - 1);
    const n = Math.floor(months / s.lengthMonths);
    const startMonths = s.startYear * 12 + (s.startMonth - 1) + n * s.lengthMonths;
    const key = `${Math.floor(startMonths / 12)}-${String((startMonths % 12) + 1).padStart(2, "0")}`;
    if (seen.has(`${key}|${c.subjectSlug}`)) continue;
    seen.add(`${key}|${c.subjectSlug}`);
    const t = out.get(key) ?? { hundredths: 0, certificates: 0 };
    t.hundredths += Math.round(c.ceHours * 100);
    t.certificates += 1;
    out.set(key, t);
  }
  return out;
}

describe("hours by reporting period (properties over random histories)", () => {
  it("every date lies in its period, which starts on the 1st at 00:00 UTC and lasts lengthMonths", () => {
    fc.assert(
      fc.property(settingArb, dateArb, (s, d) => {
        const p = periodOf(d, s);
        expect(p.start.getTime()).toBeLessThanOrEqual(d.getTime());
        expect(d.getTime()).toBeLessThan(p.end.getTime());
        expect(p.start.getUTCDate()).toBe(1);
        expect(p.start.getUTCHours()).toBe(0);
        const months = (p.end.getUTCFullYear() - p.start.getUTCFullYear()) * 12 + p.end.getUTCMonth() - p.start.getUTCMonth();
        expect(months).toBe(s.lengthMonths);
        // a whole number of periods away from the one the setting names
        const fromAnchor = (p.start.getUTCFullYear() - s.startYear) * 12 + p.start.getUTCMonth() - (s.startMonth - 1);
        expect(((fromAnchor % s.lengthMonths) + s.lengthMonths) % s.lengthMonths).toBe(0);
        // the next period starts where this one ends
        expect(periodOf(p.end, s).start.getTime()).toBe(p.end.getTime());
      }),
      { numRuns: 300 },
    );
  });

  it("the period totals add up to the hours of the certificates counted, each certificate counted at most once", () => {
    const certArb = fc.record({
      kind: fc.constantFrom("module" as const, "module" as const, "path" as const),
      subjectSlug: fc.constantFrom("a", "b", "c", "d"),
      ceHours: fc.integer({ min: 25, max: 800 }).map((h) => h / 100),
      issuedAt: dateArb,
      status: fc.constantFrom("valid" as const, "expired" as const, "revoked" as const),
    });
    fc.assert(
      fc.property(settingArb, fc.array(certArb, { maxLength: 40 }), (s, certs) => {
        const { totals, counting } = hoursByPeriod(certs, s);
        const counted = certs.filter((c) => counting.get(c) === "counted");
        const sum = (xs: number[]) => xs.reduce((n, x) => n + Math.round(x * 100), 0);
        expect(sum(totals.map((t) => t.hours))).toBe(sum(counted.map((c) => c.ceHours)));
        expect(totals.reduce((n, t) => n + t.certificates, 0)).toBe(counted.length);
        // never a path or a revoked certificate; never one module twice in one period
        for (const c of counted) expect(c.kind === "module" && c.status !== "revoked").toBe(true);
        const keys = counted.map((c) => `${periodOf(c.issuedAt, s).start.getTime()}|${c.subjectSlug}`);
        expect(new Set(keys).size).toBe(keys.length);
        // and every module certificate that is not revoked counts unless its module already did in that period
        for (const c of certs) if (c.kind === "module" && c.status !== "revoked" && counting.get(c) !== "counted") expect(counting.get(c)).toBe("repeat");
      }),
      { numRuns: 200 },
    );
  });

  it("each period's total matches the certificates issued in it, reckoned independently (months counted from the setting's start)", () => {
    const certArb = fc.record({
      kind: fc.constantFrom("module" as const, "module" as const, "path" as const),
      subjectSlug: fc.constantFrom("a", "b", "c"),
      ceHours: fc.integer({ min: 25, max: 800 }).map((h) => h / 100),
      issuedAt: dateArb,
      status: fc.constantFrom("valid" as const, "expired" as const, "revoked" as const),
    });
    fc.assert(
      fc.property(settingArb, fc.array(certArb, { maxLength: 40 }), (s, certs) => {
        const expected = reckon(certs, s);
        const { totals } = hoursByPeriod(certs, s);
        const got = new Map(
          totals
            .filter((t) => t.certificates > 0 || t.hours > 0)
            .map((t) => [`${t.start.getUTCFullYear()}-${String(t.start.getUTCMonth() + 1).padStart(2, "0")}`, { hundredths: Math.round(t.hours * 100), certificates: t.certificates }]),
        );
        expect(got).toEqual(expected);
      }),
      { numRuns: 300 },
    );
  });
});
