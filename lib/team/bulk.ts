import "server-only";
import { createHash } from "node:crypto";
import { after } from "next/server";
import { and, eq, inArray, isNull } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { team, user } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { audit } from "@/lib/audit";
import { sendMail } from "@/lib/mail";
import { insertInvitation, inviteMail, pendingEmails } from "./invites";
import { checkRoster, decodeRoster, parseRoster, type CheckedRow, type RawRosterRow, type RosterFileProblem } from "./roster";
import { ROSTER_MAX_BYTES } from "./schemas";
import type { Locale } from "@/lib/i18n/browser";
import { assertSeatAvailable, seatUsage } from "@/lib/billing";

export type RosterPreview = {
  fileHash: string;
  fileName: string;
  total: number;
  valid: number;
  invalid: number;
  seats: { seats: number; used: number };
  rows: CheckedRow[];
};

/** Reads the uploaded file from a multipart form (field "file"); refuses anything unusable. */
export async function readUpload(req: Request): Promise<{ bytes: Uint8Array; fileName: string; form: FormData }> {
  const length = Number(req.headers.get("content-length") ?? 0);
  if (length > ROSTER_MAX_BYTES + 64 * 1024) throw new DomainError("too-large", `The file is larger than the ${ROSTER_MAX_BYTES / (1024 * 1024)} MB limit. Split it into smaller files.`);
  let form: FormData;
  try {
    form = await req.formData();
  } catch {
    throw new DomainError("invalid", "Send the roster as a file upload (multipart form with a field named “file”).");
  }
  const file = form.get("file");
  if (!file || typeof file === "string") throw new DomainError("invalid", "Choose a CSV file to upload.", { file: ["Choose a CSV file"] });
  if (file.size > ROSTER_MAX_BYTES) throw new DomainError("too-large", `The file is ${Math.round(file.size / 1024)} KB; the limit is ${ROSTER_MAX_BYTES / (1024 * 1024)} MB. Split it into smaller files.`);
  return { bytes: new Uint8Array(await file.arrayBuffer()), fileName: file.name || "roster.csv", form };
}

/** 400 with the English text, plus its catalog key and parts so the page can show it in the reader's language. */
const fileError = (p: RosterFileProblem) => new DomainError("invalid", p.error, { file: [p.error] }, { errorKey: p.message.key, errorValues: p.message.values });

function rowsOf(bytes: Uint8Array, fileName: string): RawRosterRow[] {
  const decoded = decodeRoster(bytes, fileName);
  if ("error" in decoded) throw fileError(decoded);
  const parsed = parseRoster(decoded.text);
  if ("error" in parsed) throw fileError(parsed);
  return parsed.rows;
}

async function checkAgainstDb(orgId: string, orgName: string, raw: RawRosterRow[], tx: Tx | typeof db = db): Promise<CheckedRow[]> {
  const emails = [...new Set(raw.map((r) => r.email.toLowerCase()).filter(Boolean))];
  const teams = await tx.select({ id: team.id, name: team.name }).from(team).where(and(eq(team.organizationId, orgId), isNull(team.archivedAt)));
  // Only this organization's members are looked up: whether an address has an account elsewhere
  // is never revealed here (acceptance resolves it).
  const members = new Set<string>();
  for (let i = 0; i < emails.length; i += 500) {
    const chunk = emails.slice(i, i + 500);
    const found = await tx.select({ email: user.email }).from(user).where(and(inArray(user.email, chunk), eq(user.organizationId, orgId)));
    for (const u of found) members.add(u.email.toLowerCase());
  }
  const pending = await pendingEmails(orgId, emails, tx);
  const usage = await seatUsage(orgId, tx);
  return checkRoster(raw, {
    orgName,
    teams: new Map(teams.map((t) => [t.name.toLowerCase(), t])),
    members,
    pending,
    seats: usage.seats,
    used: usage.members + usage.pending,
  });
}

export const fileHashOf = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

/** Preview: every row with its problems. Writes nothing. */
export async function previewRoster(org: { orgId: string; orgName: string }, bytes: Uint8Array, fileName: string): Promise<RosterPreview> {
  const rows = await checkAgainstDb(org.orgId, org.orgName, rowsOf(bytes, fileName));
  const usage = await seatUsage(org.orgId);
  const valid = rows.filter((r) => r.problems.length === 0).length;
  return { fileHash: fileHashOf(bytes), fileName, total: rows.length, valid, invalid: rows.length - valid, seats: { seats: usage.seats, used: usage.members + usage.pending }, rows };
}

/**
 * Import: the same file again (its hash must match the preview the manager saw), checked again
 * against the data as it is now, inside one transaction that writes every valid row or none.
 * Mails go out after the response.
 */
export async function importRoster(viewer: Viewer, org: { orgId: string; orgName: string }, bytes: Uint8Array, fileName: string, previewHash: string, ip: string, language: Locale) {
  if (fileHashOf(bytes) !== previewHash) throw new DomainError("conflict", "The file differs from the one you previewed. Check it again before importing.");
  const raw = rowsOf(bytes, fileName);
  const teamNames = new Map((await db.select({ id: team.id, name: team.name }).from(team).where(eq(team.organizationId, org.orgId))).map((t) => [t.id, t.name]));
  const result = await db.transaction(async (tx) => {
    await seatUsage(org.orgId, tx, true); // lock the organization row for the whole import
    const rows = await checkAgainstDb(org.orgId, org.orgName, raw, tx);
    const valid = rows.filter((r) => r.problems.length === 0);
    const mails: ReturnType<typeof inviteMail>[] = [];
    for (const r of valid) {
      const email = r.email.toLowerCase();
      const created = await insertInvitation(tx, org.orgId, { email, name: r.name || null, role: r.roleValue!, teamId: r.teamId, language }, viewer);
      await audit(
        {
          actor: viewer,
          organizationId: org.orgId,
          action: "invite.send",
          targetType: "invitation",
          targetId: created.id,
          ip,
          details: { email, role: r.roleValue, teamId: r.teamId, language, replaced: created.replaced, via: "csv", line: r.line },
        },
        tx,
      );
      mails.push(inviteMail({ to: email, name: r.name || null, orgName: org.orgName, inviterName: viewer.name, role: r.roleValue!, teamName: r.teamId ? teamNames.get(r.teamId) : null, token: created.token, expiresAt: created.expiresAt, language }));
    }
    if (valid.length) await assertSeatAvailable(org.orgId, 0, tx);
    return { imported: valid.length, skipped: rows.length - valid.length, mails, rows };
  });
  after(async () => {
    for (const m of result.mails) await sendMail(m);
  });
  return { imported: result.imported, skipped: result.skipped, skippedRows: result.rows.filter((r) => r.problems.length > 0).map((r) => ({ line: r.line, email: r.email, problems: r.problems })) };
}
