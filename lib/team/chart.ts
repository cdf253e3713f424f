/**
 * Axis settings of the board's two charts (plain data). Every week gets its label (interval 0:
 * recharts' default "preserveEnd"/"preserveStartEnd" drops labels it thinks crowd, which hid a
 * week), tilted so twelve fit; the percent axis leaves room on the right for "100%".
 */
export const WEEK_AXIS = { interval: 0, angle: -35, textAnchor: "end", height: 44, fontSize: 11 } as const;
export const PERCENT_AXIS = { ticks: [0, 25, 50, 75, 100], fontSize: 11 } as const;

/** Room the last tick label needs past the plot's right edge: half its width, in px. */
export function halfLabelWidth(text: string, fontSize: number): number {
  // Digits and "%" are at most ~0.62 and ~0.9 em wide in common sans faces (estimate, not measured per font).
  return [...text].reduce((w, ch) => w + (ch === "%" ? 0.9 : 0.62) * fontSize, 0) / 2;
}

export const PERCENT_CHART_MARGIN = { top: 8, right: Math.ceil(halfLabelWidth("100%", PERCENT_AXIS.fontSize)) + 8, bottom: 0, left: 8 };
