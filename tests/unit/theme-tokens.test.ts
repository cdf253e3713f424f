// The palette is defined once as Tailwind theme tokens in app/globals.css (@theme, --color-*);
// lib/theme/tokens.ts mirrors it for code that cannot read CSS (PDF, chart props). This keeps the
// two identical, and checks the stated WCAG 2.1 contrast ratios (SC 1.4.3, 4.5:1 for body text;
// relative luminance formula from WCAG 2.1 "relative luminance" definition).
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { palette } from "@/lib/theme/tokens";

const css = readFileSync(path.join(process.cwd(), "app/globals.css"), "utf8");
const theme = /@theme\s*{([^}]*)}/.exec(css)?.[1] ?? "";
const tokens = Object.fromEntries([...theme.matchAll(/--color-([a-z-]+):\s*(#[0-9A-Fa-f]{6})/g)].map((m) => [m[1]!, m[2]!.toUpperCase()]));

function luminance(hex: string): number {
  const c = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((v) => (v <= 0.03928 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4));
  return 0.2126 * c[0]! + 0.7152 * c[1]! + 0.0722 * c[2]!;
}
const contrast = (a: string, b: string) => {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
};

describe("palette tokens", () => {
  it("globals.css @theme and lib/theme/tokens.ts hold the same colours", () => {
    expect(Object.keys(tokens).length).toBeGreaterThan(10);
    expect(tokens).toEqual(Object.fromEntries(Object.entries(palette).map(([k, v]) => [k, v.toUpperCase()])));
  });

  it("text colours meet WCAG AA (4.5:1) on paper", () => {
    for (const t of ["ink", "muted", "copper", "water", "caution", "pass"] as const) expect(contrast(palette[t], palette.paper), t).toBeGreaterThanOrEqual(4.5);
  });

  it("status pills, buttons and the header keep 4.5:1 text on their own fills", () => {
    // text colour on the fill it sits on: pills (light fills), buttons (white on copper and caution), the header
    const pairs = [["water", "water-light"], ["pass", "pass-light"], ["caution", "caution-light"], ["copper", "copper-light"], ["muted", "panel"], ["panel", "copper"], ["panel", "caution"], ["paper", "ink"]] as const;
    for (const [fg, bg] of pairs) expect(contrast(tokens[fg]!, tokens[bg]!), `${fg} on ${bg}`).toBeGreaterThanOrEqual(4.5);
  });

  it("the focus ring keeps 3:1 against what surrounds it (WCAG 1.4.11 non-text contrast)", () => {
    for (const bg of ["paper", "panel"] as const) expect(contrast(palette.water, palette[bg]), `water ring on ${bg}`).toBeGreaterThanOrEqual(3);
    // on the dark header the ring is paper: water on ink would be about 2.4:1
    expect(contrast(palette.water, palette.ink)).toBeLessThan(3);
    expect(css).toMatch(/\.on-dark :focus-visible\s*{\s*outline-color: var\(--color-paper\)/);
    expect(contrast(palette.paper, palette.ink)).toBeGreaterThanOrEqual(3);
    expect(readFileSync(path.join(process.cwd(), "components/shell/site-header.tsx"), "utf8")).toMatch(/<header className="on-dark /);
  });

  it("no component or page outside the calculators repeats a palette hex value", () => {
    const values = Object.values(palette).filter((v) => v !== "#FFFFFF");
    const pattern = new RegExp(values.join("|"), "i");
    const skip = [path.join("components", "tools"), path.join("app", "(app)", "tools")];
    const offenders: string[] = [];
    for (const root of ["components", "app"]) {
      for (const file of readdirSync(root, { recursive: true }) as string[]) {
        const rel = path.join(root, file);
        if (!/\.(tsx?|css)$/.test(rel) || rel === path.join("app", "globals.css") || skip.some((s) => rel.startsWith(s))) continue;
        if (pattern.test(readFileSync(rel, "utf8"))) offenders.push(rel);
      }
    }
    expect(offenders).toEqual([]);
  });
});
