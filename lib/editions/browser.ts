/**
 * Input schemas for adopted editions and local amendments, shared by the manager's forms
 * (react-hook-form) and the route handlers. No server code here.
 */
import { z } from "zod";
import { cardTopic, editionYear } from "@/lib/content/browser";

export { EDITIONS, editionLabel, editionYear, type EditionYear } from "@/lib/content/browser";

/** Longest local note, in characters (shown in full beside lessons and cards). */
export const AMENDMENT_MAX = 500;

const optionalOrg = z
  .string()
  .trim()
  .max(36)
  .optional()
  .transform((v) => (v ? v : undefined));

/** Letters, digits, spaces and common punctuation; no control or invisible characters. */
const plainLine = (what: string, max: number) =>
  z
    .string({ message: `Enter the ${what}` })
    .trim()
    .min(1, `Enter the ${what}`)
    .max(max, `At most ${max} characters`)
    .refine((v) => !/[\p{Cc}\p{Cf}]/u.test(v), "Use plain text without control characters");

export const jurisdictionSchema = z.object({
  name: plainLine("jurisdiction (city or county)", 120),
  state: plainLine("state or province", 60),
  edition: editionYear,
  ircP2904: z.boolean({ message: "Say whether IRC P2904 is in force" }),
  isDefault: z.boolean().default(false),
  org: optionalOrg,
});
export type JurisdictionInput = z.input<typeof jurisdictionSchema>;

export const jurisdictionUpdateSchema = z
  .object({
    name: jurisdictionSchema.shape.name.optional(),
    state: jurisdictionSchema.shape.state.optional(),
    edition: editionYear.optional(),
    ircP2904: z.boolean().optional(),
    isDefault: z.boolean().optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: "Nothing to change" });

export const TOPIC_LABELS: Record<z.infer<typeof cardTopic>, string> = {
  system: "How systems work",
  pipe: "Pipe and joining",
  sprinklers: "Sprinklers and coverage",
  freeze: "Freeze protection",
  hydraulics: "Hydraulics",
  testing: "Testing",
  trades: "Other trades",
  officials: "Officials",
  sales: "Sales",
};

export const amendmentSchema = z.object({
  topic: cardTopic,
  body: z
    .string({ message: "Write the local rule" })
    .trim()
    .min(5, "Write the local rule (at least 5 characters)")
    .max(AMENDMENT_MAX, `At most ${AMENDMENT_MAX} characters`)
    .refine((v) => !/[\p{Cc}\p{Cf}]/u.test(v.replace(/\r?\n/g, " ")), "Use plain text without control characters"),
  org: optionalOrg,
});
export type AmendmentInput = z.input<typeof amendmentSchema>;
