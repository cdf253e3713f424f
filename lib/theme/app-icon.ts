import { palette } from "./tokens";

/**
 * Riser's home-screen icon as SVG, drawn from the palette tokens: a copper riser pipe with its
 * paper-white deflector and water-light spray on the ink ground (the same mark as app/icon.svg).
 * `maskable` keeps the drawing inside the central 80 % safe zone that launchers may crop to a circle.
 * scripts/icons.ts renders the PNGs in public/icons from it with sharp.
 */
export function appIconSvg({ size, maskable = false }: { size: number; maskable?: boolean }): string {
  // Drawn on a 32-unit grid; the maskable variant shrinks the mark to 70 % around the centre.
  const scale = maskable ? 0.7 : 1;
  const offset = (32 - 32 * scale) / 2;
  const corner = maskable ? 0 : 6;
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32" width="${size}" height="${size}">
  <rect x="0" y="0" width="32" height="32" rx="${corner}" fill="${palette.ink}"/>
  <g transform="translate(${offset} ${offset}) scale(${scale})">
    <rect x="13.5" y="13" width="5" height="16" fill="${palette["copper-bright"]}"/>
    <rect x="11.5" y="26" width="9" height="3" fill="${palette["copper-bright"]}"/>
    <rect x="15" y="9" width="2" height="4" fill="${palette.paper}"/>
    <rect x="6" y="6" width="20" height="3" rx="1.5" fill="${palette.paper}"/>
    <circle cx="6" cy="13" r="1.6" fill="${palette["water-light"]}"/>
    <circle cx="26" cy="13" r="1.6" fill="${palette["water-light"]}"/>
    <circle cx="9" cy="17" r="1.4" fill="${palette["water-light"]}"/>
    <circle cx="23" cy="17" r="1.4" fill="${palette["water-light"]}"/>
  </g>
</svg>`;
}

/** The PNG icons the web app manifest lists (public/icons, written by scripts/icons.ts). */
export const APP_ICONS = [
  { file: "riser-192.png", size: 192, maskable: false },
  { file: "riser-512.png", size: 512, maskable: false },
  { file: "riser-maskable-512.png", size: 512, maskable: true },
  { file: "riser-apple-180.png", size: 180, maskable: true },
] as const;
