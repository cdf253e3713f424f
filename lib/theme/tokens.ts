/**
 * Riser's palette as values for code that cannot read CSS: the PDF typesetter (lib/pdf) and the
 * charts (recharts props). The same tokens are the Tailwind theme in app/globals.css (`@theme`,
 * `--color-<name>`); tests/unit/theme-tokens.test.ts fails if the two ever differ.
 * Contrast checked against paper for WCAG AA (ratios beside each token).
 */
export const palette = {
  ink: "#14202B", // body text, 15.6:1 on paper
  paper: "#F7F4EE", // page background
  panel: "#FFFFFF",
  line: "#D5CFC3", // borders and rules
  muted: "#56616B", // secondary text, 5.9:1 on paper
  copper: "#9A4F12", // actions; darkened from copper-bright for 5.6:1 on paper
  "copper-light": "#F3E3D3",
  "copper-bright": "#B5651D", // the mark only (not for text)
  water: "#1B617A", // links and information, 6.3:1 on paper
  "water-light": "#DCECF1",
  caution: "#B42318", // warnings and errors, 6.0:1 on paper
  "caution-light": "#FBE4E1",
  pass: "#2D6A2E",
  "pass-light": "#E2F0DF",
} as const;

export type ColorToken = keyof typeof palette;

/** `var(--color-<token>)`, for SVG attributes and inline styles that follow the theme. */
export const cssColor = (token: ColorToken) => `var(--color-${token})`;

/** Colours for recharts (axis ticks, grid, series), from the same tokens. */
export const chartColors = {
  grid: palette.line,
  axis: palette.ink,
  primary: palette.water,
  secondary: palette.copper,
  caution: palette.caution,
  pass: palette.pass,
} as const;
