/** The theme palette (lib/theme/tokens.ts) as pdf-lib colours. */
import { rgb, type RGB } from "pdf-lib";
import { palette, type ColorToken } from "@/lib/theme/browser";

export function hexToRgb(h: string): RGB {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(h);
  if (!m) throw new Error(`not a #RRGGBB colour: ${h}`);
  return rgb(parseInt(m[1]!, 16) / 255, parseInt(m[2]!, 16) / 255, parseInt(m[3]!, 16) / 255);
}

export const C = Object.fromEntries(Object.entries(palette).map(([k, v]) => [k, hexToRgb(v)])) as Record<ColorToken, RGB>;
