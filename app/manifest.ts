import type { MetadataRoute } from "next";
import { APP_ICONS, palette } from "@/lib/theme";

/**
 * The web app manifest (/manifest.webmanifest): Riser installs on a phone's home screen and opens
 * to the learner's home. Icons are drawn for Riser from its palette (scripts/icons.ts).
 */
export default function manifest(): MetadataRoute.Manifest {
  return {
    id: "/learn",
    name: "Riser — residential sprinkler training",
    short_name: "Riser",
    description: "Lessons, code-reference cards and field calculators for residential fire-sprinkler work, also on a job site with no signal.",
    start_url: "/learn",
    scope: "/",
    display: "standalone",
    orientation: "any",
    background_color: palette.paper,
    theme_color: palette.ink,
    categories: ["education", "productivity"],
    icons: APP_ICONS.map((i) => ({
      src: `/icons/${i.file}`,
      sizes: `${i.size}x${i.size}`,
      type: "image/png",
      purpose: i.maskable ? "maskable" : "any",
    })),
  };
}
