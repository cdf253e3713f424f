import localFont from "next/font/local";

// Shipped with the app from npm font packages; nothing is fetched at build or run time.
// The body face is the npm package's TTF in WOFF2 (scripts/fonts.mjs: every glyph, about 23 kB a
// face on the wire instead of about 30 kB for the TTF gzipped). Every page preloads the faces.
// Not preloading them was measured (Lighthouse mobile, bench/lighthouse.ts): the first text then
// shows in the fallback face and swaps, shifting the layout (CLS 0.05 on a lesson, 0.19-0.24 on
// /learn, where it was 0), which costs more than the bytes it saves.
export const bodyFont = localFont({
  src: [
    { path: "./_fonts/AtkinsonHyperlegible_400Regular.woff2", weight: "400", style: "normal" },
    { path: "./_fonts/AtkinsonHyperlegible_400Regular_Italic.woff2", weight: "400", style: "italic" },
    { path: "./_fonts/AtkinsonHyperlegible_700Bold.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-body",
  display: "swap",
});

export const monoFont = localFont({
  src: [{ path: "../node_modules/@fontsource/ibm-plex-mono/files/ibm-plex-mono-latin-400-normal.woff2", weight: "400", style: "normal" }],
  variable: "--font-mono",
  display: "swap",
});
