/** Admin console input: shared by the forms (react-hook-form) and the route handlers. No server code. */
import { z } from "zod";
import { ROLES } from "@/lib/access/browser";

export const ORGANIZATION_KINDS = ["contractor", "builder"] as const;

const reasonRequired = z
  .string({ error: "Give a reason; it goes into the audit log" })
  .trim()
  .min(3, "Give a reason of at least 3 characters; it goes into the audit log")
  .max(500, "At most 500 characters");
const reasonOptional = z.string({ error: "Write the reason as text" }).trim().max(500, "At most 500 characters").optional();
const orgName = z.string({ error: "Enter a name" }).trim().min(2, "Enter at least 2 characters").max(200, "At most 200 characters");

export const createOrganizationSchema = z.object({
  name: orgName,
  kind: z.enum(ORGANIZATION_KINDS, { message: "Choose contractor or builder" }),
  seats: z.coerce.number({ message: "Enter a whole number" }).int("Enter a whole number").min(0, "At least 0").max(10_000, "At most 10,000"),
});
export type CreateOrganizationInput = z.infer<typeof createOrganizationSchema>;

export const renameOrganizationSchema = z.object({ name: orgName });

export const changeRoleSchema = z.object({
  role: z.enum(ROLES, { message: "Choose a role" }),
  reason: reasonRequired,
});

export const moveOrganizationSchema = z.object({
  organizationId: z.string({ error: "Choose an organization" }).trim().min(1, "Choose an organization").max(36),
  reason: reasonOptional,
});

export const banSchema = z.object({
  reason: reasonRequired,
  /** empty = until lifted */
  days: z
    .union([z.literal(""), z.coerce.number().int("Enter whole days").min(1, "At least 1 day").max(3650, "At most 3,650 days")])
    .optional()
    .transform((v) => (v === "" || v === undefined ? null : v)),
});

export const unbanSchema = z.object({ reason: reasonOptional });
export const signOutSchema = z.object({ reason: reasonOptional });

/** Query of a server-paginated, sortable table. */
export function tableQuery<const S extends readonly [string, ...string[]]>(sortKeys: S, defaultSort: S[number], defaultDir: "asc" | "desc") {
  return z.object({
    page: z.coerce.number().int().min(1).max(100_000).catch(1),
    pageSize: z.coerce.number().int().min(5).max(100).catch(25),
    sort: z.enum(sortKeys).catch(defaultSort as never),
    dir: z.enum(["asc", "desc"]).catch(defaultDir),
  });
}

const optionalText = z
  .string()
  .trim()
  .max(200)
  .optional()
  .transform((v) => (v ? v : undefined));
const isoDay = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2026-12-01")
  .optional()
  .or(z.literal("").transform(() => undefined));

export const peopleQuery = tableQuery(["name", "email", "role", "organization", "createdAt"], "name", "asc").extend({
  q: optionalText,
  role: z.enum(ROLES).optional().catch(undefined),
  organizationId: optionalText, // an id, or "none"
  status: z.enum(["active", "banned"]).optional().catch(undefined),
});

export const organizationsQuery = tableQuery(["name", "kind", "seats", "members", "createdAt"], "name", "asc").extend({ q: optionalText });

export const mailQuery = tableQuery(["at", "to", "subject", "status"], "at", "desc").extend({
  q: optionalText,
  status: z.enum(["sent", "failed"]).optional().catch(undefined),
});

export const auditQuery = tableQuery(["at", "action", "actor", "target"], "at", "desc").extend({
  action: optionalText,
  actor: optionalText,
  organizationId: optionalText,
  from: isoDay,
  to: isoDay,
});

export type Paged<R> = { rows: R[]; total: number; page: number; pageSize: number };
