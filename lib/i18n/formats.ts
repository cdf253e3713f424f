import type { Formats } from "next-intl";

/** The named formats every message may use, on the server (i18n/request.ts) and in nested providers. */
export const FORMATS = {
  dateTime: { short: { year: "numeric", month: "short", day: "numeric" } },
  number: { precise: { maximumFractionDigits: 2 } },
} satisfies Formats;
