/** The reporting-period form's input (pure: used by the form in the browser and by the route). */
import { z } from "zod";
import { PERIOD_LENGTHS } from "./period";

export const periodSettingInput = z.object({
  /** a year in which one period starts (for calendar years: any year, e.g. 2026) */
  startYear: z.coerce.number({ error: "Enter the year a licence period starts" }).int("Enter a whole year").min(1990, "Enter a year from 1990").max(2100, "Enter a year up to 2100"),
  startMonth: z.coerce.number({ error: "Choose the month a licence period starts" }).int().min(1, "Choose a month").max(12, "Choose a month"),
  lengthMonths: z.coerce
    .number({ error: "Choose how long a licence period lasts" })
    .int()
    .refine((n) => (PERIOD_LENGTHS as readonly number[]).includes(n), `A licence period lasts ${PERIOD_LENGTHS.join(", ")} months`),
  org: z.string().max(36).optional(),
});
export type PeriodSettingInput = z.input<typeof periodSettingInput>;
