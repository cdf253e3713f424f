/**
 * Team-management input schemas and plain rules shared by the browser (react-hook-form) and the
 * server (route handlers). No server code here.
 */
import { z } from "zod";
import { email, password, personName } from "@/lib/auth/browser";
import { slug } from "@/lib/content/browser";
import { LOCALES } from "@/lib/i18n/browser";

export const INVITE_ROLES = ["learner", "sales", "manager"] as const;
export type InviteRole = (typeof INVITE_ROLES)[number];
export const ROLE_LABELS: Record<InviteRole, string> = { learner: "Learner", sales: "Sales", manager: "Manager" };

/** A manager's choice of the language new invitations start with. */
export const orgLanguageSchema = z.object({ language: z.enum(LOCALES, { message: "Choose English or Español" }), org: z.string().max(36).optional() });

/** How long an invitation link works (Riser's own choice). */
export const INVITE_DAYS = 7;

/** Bulk upload limits, stated to the manager in the form and in every refusal. */
export const ROSTER_MAX_ROWS = 2000;
export const ROSTER_MAX_BYTES = 1024 * 1024;
export const ROSTER_COLUMNS = ["email", "name", "role", "team"] as const;

const optionalId = z
  .string()
  .trim()
  .max(36)
  .optional()
  .transform((v) => (v ? v : undefined));

export const inviteSchema = z.object({
  email,
  name: z
    .string()
    .trim()
    .max(200, "At most 200 characters")
    .optional()
    .transform((v) => (v ? v : undefined)),
  role: z.enum(INVITE_ROLES, { message: "Choose learner, sales or manager" }),
  teamId: optionalId,
  /** the invitation's language (mail and the new account); absent → the organization's default */
  language: z.enum(LOCALES, { message: "Choose English or Español" }).optional(),
  /** admins only: which organization the invitation is for */
  org: optionalId,
  /** work assigned when the invitation is accepted */
  assign: z.array(z.lazy(() => assignItemSchema)).max(10, "At most 10 items per invitation").optional(),
});
export type InviteInput = z.input<typeof inviteSchema>;

/** One module or path with a due date, carried by an invitation until it is accepted. */
export const assignItemSchema = z.object({
  kind: z.enum(["module", "path"], { message: "Choose a module or a learning path" }),
  slug: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "Choose a module or a learning path").max(80),
  dueAt: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, "Pick a due date")
    .refine((d) => !Number.isNaN(new Date(`${d}T23:59:59.000Z`).getTime()), "Pick a real date")
    .refine((d) => new Date(`${d}T23:59:59.000Z`).getTime() >= Date.now(), "Pick today or a later date"),
});
export type AssignItem = z.infer<typeof assignItemSchema>;
export const inviteAssignSchema = z.object({ items: z.array(assignItemSchema).min(1, "Choose at least one module or path").max(10, "At most 10 items per invitation") });

const teamName = z.string().trim().min(1, "Name the team").max(120, "At most 120 characters");
export const createTeamSchema = z.object({ name: teamName, org: optionalId });
export const updateTeamSchema = z
  .object({ name: teamName.optional(), archived: z.boolean().optional(), org: optionalId })
  .refine((v) => v.name !== undefined || v.archived !== undefined, { path: ["name"], message: "Give a new name, or archive or restore the team" });

/** A manager's change to a person: team (null = no team) and/or role; admin is never offered. */
export const updatePersonSchema = z
  .object({
    teamId: z.string().trim().max(36).nullable().optional().transform((v) => (v === "" ? null : v)),
    role: z.enum(INVITE_ROLES, { message: "Choose learner, sales or manager" }).optional(),
  })
  .refine((v) => v.teamId !== undefined || v.role !== undefined, { path: ["role"], message: "Choose a team or a role" });

/** Roster previews per manager per window (DB-backed; the preview is where addresses are checked). */
export const ROSTER_PREVIEW_LIMIT = { max: 20, windowSeconds: 600 };

export const acceptInviteSchema = z
  .object({ token: z.string().min(20).max(100), name: personName, password, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" });
export type AcceptInviteInput = z.infer<typeof acceptInviteSchema>;

const isoDay = /^\d{4}-\d{2}-\d{2}$/;

/** "2027-03-14" → the end of that day, UTC (due dates are whole days). */
export function endOfDayUtc(day: string): Date {
  return new Date(`${day}T23:59:59.000Z`);
}

export const assignSchema = z
  .object({
    kind: z.enum(["module", "path"], { message: "Choose a module or a learning path" }),
    slug,
    userIds: z.array(z.string().min(1).max(36)).max(500, "At most 500 people at once").default([]),
    teamIds: z.array(z.string().min(1).max(36)).max(100).default([]),
    dueAt: z
      .string()
      .regex(isoDay, "Pick a due date")
      .refine((d) => !Number.isNaN(endOfDayUtc(d).getTime()), "Pick a real date")
      .refine((d) => endOfDayUtc(d).getTime() >= Date.now(), "Pick today or a later date"),
    org: optionalId,
  })
  .refine((v) => v.userIds.length + v.teamIds.length > 0, { path: ["targets"], message: "Choose at least one person or team" });
export type AssignInput = z.input<typeof assignSchema>;

/** Cell statuses of the team board, in the order the legend shows them. */
export const BOARD_STATUSES = ["not_started", "in_progress", "passed", "failed", "expiring", "expired", "overdue"] as const;
export type BoardStatus = (typeof BOARD_STATUSES)[number];
export const STATUS_LABELS: Record<BoardStatus, string> = {
  not_started: "Not started",
  in_progress: "In progress",
  passed: "Passed",
  failed: "Failed last attempt",
  expiring: "Certificate expiring",
  expired: "Expired",
  overdue: "Overdue",
};

export const BOARD_SORTS = ["name", "team", "progress", "overdue", "due"] as const;
export type BoardSort = (typeof BOARD_SORTS)[number];

export const boardQuerySchema = z.object({
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
  team: z.string().max(36).optional(),
  status: z.enum(BOARD_STATUSES).optional(),
  module: slug.optional(),
  dueBefore: z.string().regex(isoDay, "Use a date like 2027-03-14").optional(),
  sort: z.enum(BOARD_SORTS).default("name"),
  dir: z.enum(["asc", "desc"]).optional(),
  q: z.string().trim().max(100).optional(),
  org: z.string().max(36).optional(),
});
export type BoardQuery = z.infer<typeof boardQuerySchema>;

/** Reads a board query from URL search params; empty values count as absent. */
export function parseBoardQuery(params: URLSearchParams) {
  const raw: Record<string, string> = {};
  for (const [k, v] of params) if (v !== "") raw[k] = v;
  return boardQuerySchema.safeParse(raw);
}
