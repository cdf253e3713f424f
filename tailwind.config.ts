import type { Config } from "tailwindcss";

/** Riser's type and widths. The palette is the @theme block of app/globals.css (one definition). */
const config: Config = {
  content: ["./app/**/*.{ts,tsx,mdx}", "./components/**/*.{ts,tsx}", "./content/**/*.mdx", "./mdx-components.tsx"],
  theme: {
    extend: {
      fontFamily: {
        sans: ["var(--font-body)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      maxWidth: { prose: "70ch" },
    },
  },
};
export default config;
