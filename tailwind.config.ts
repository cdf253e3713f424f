import type { Config } from "tailwindcss";

/** Riser's palette and type, defined once. Contrast checked against paper (#F7F4EE) for WCAG AA. */
const config: Config = {
  content: ["./app/**/*.{ts,tsx,mdx}", "./components/**/*.{ts,tsx}", "./content/**/*.mdx", "./mdx-components.tsx"],
  theme: {
    extend: {
      colors: {
        ink: "#14202B", // body text, 15.6:1 on paper
        paper: "#F7F4EE", // page background
        panel: "#FFFFFF",
        line: "#D5CFC3", // borders and rules
        muted: "#56616B", // secondary text, 5.9:1 on paper
        copper: { DEFAULT: "#9A4F12", light: "#F3E3D3" }, // actions; darkened from #B5651D for 5.6:1 on paper
        water: { DEFAULT: "#1B617A", light: "#DCECF1" }, // links and information, 6.3:1 on paper
        caution: { DEFAULT: "#B42318", light: "#FBE4E1" }, // warnings and errors, 6.0:1 on paper
        pass: { DEFAULT: "#2D6A2E", light: "#E2F0DF" },
      },
      fontFamily: {
        sans: ["var(--font-body)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      maxWidth: { prose: "70ch" },
    },
  },
};
export default config;
