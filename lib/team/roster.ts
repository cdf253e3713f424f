/**
 * Roster CSV for bulk invitations: decoding, parsing (papaparse) and per-row checks, as pure
 * functions (no database here: the caller passes what the checks need). The same code runs for
 * the preview and again, against fresh data, when the manager confirms the import.
 */
import Papa from "papaparse";
import { csvLines } from "@/lib/csv";
import { z } from "zod";
import { createTranslator } from "use-intl/core";
import enTeam from "@/messages/en/team.json";
import type { RosterMessage } from "./roster-text";
import { INVITE_ROLES, ROSTER_COLUMNS, ROSTER_MAX_BYTES, ROSTER_MAX_ROWS, type InviteRole } from "./schemas";

/** A whole-file problem: the English text (the API's `error`) and the same as a team catalog key (`bulk.file.*`). */
export type RosterFileProblem = { error: string; message: RosterFileMessage };
export type RosterFileMessage = { key: string; values: Record<string, string | number> };

const english = createTranslator({ locale: "en-US", messages: { team: enTeam }, namespace: "team" });
const englishOf = english as unknown as (k: string, v: Record<string, string | number>) => string;

function fileProblem(name: string, values: Record<string, string | number> = {}): RosterFileProblem {
  const key = `bulk.file.${name}`;
  return { error: englishOf(key, values), message: { key, values } };
}
const LIMITS = { mb: ROSTER_MAX_BYTES / (1024 * 1024), rows: ROSTER_MAX_ROWS };

/**
 * Bytes → text. Refuses what is not a CSV (a spreadsheet workbook, a binary file), what is too
 * large, and text that is not UTF-8 (invalid byte sequences are caught by a fatal decoder).
 */
export function decodeRoster(bytes: Uint8Array, fileName: string): { text: string } | RosterFileProblem {
  if (bytes.byteLength === 0) return fileProblem("empty");
  if (bytes.byteLength > ROSTER_MAX_BYTES) return fileProblem("tooLarge", { kb: Math.round(bytes.byteLength / 1024), ...LIMITS });
  const name = fileName.toLowerCase();
  const zip = bytes[0] === 0x50 && bytes[1] === 0x4b; // PK: xlsx, ods, zip
  if (zip || /\.(xlsx|xlsm|xls|ods|numbers|zip)$/.test(name)) {
    return fileProblem("workbook");
  }
  if (!/\.(csv|txt)$/.test(name)) return fileProblem("notCsv");
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    return fileProblem("utf16");
  }
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return fileProblem("notUtf8");
  }
  if (text.includes("\u0000")) return fileProblem("binary");
  return { text: text.replace(/^\uFEFF/, "") };
}

export type RawRosterRow = { line: number; email: string; name: string; role: string; team: string };

/** Text → rows (header names are matched without case; empty lines are skipped). */
export function parseRoster(text: string): { rows: RawRosterRow[] } | RosterFileProblem {
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: false });
  const data = parsed.data;
  const header = (data[0] ?? []).map((h) => h.trim().toLowerCase().replace(/^e-mail$/, "email"));
  if (!header.includes("email")) {
    return fileProblem("noHeader", { columns: ROSTER_COLUMNS.join(",") });
  }
  const col = (n: string) => header.indexOf(n);
  const [ie, inm, ir, it] = [col("email"), col("name"), col("role"), col("team")];
  const rows: RawRosterRow[] = [];
  for (let i = 1; i < data.length; i++) {
    const cells = data[i] ?? [];
    if (cells.every((c) => c.trim() === "")) continue;
    const at = (k: number) => (k >= 0 ? (cells[k] ?? "").trim() : "");
    rows.push({ line: i + 1, email: at(ie), name: at(inm), role: at(ir), team: at(it) });
  }
  if (rows.length === 0) return fileProblem("noRows");
  if (rows.length > ROSTER_MAX_ROWS) {
    return fileProblem("tooManyRows", { count: rows.length, rows: ROSTER_MAX_ROWS });
  }
  return { rows };
}

export type RosterContext = {
  orgName: string;
  /** lower-cased team name → team id */
  teams: Map<string, { id: string; name: string }>;
  /** lower-cased e-mails with an account in this organization */
  members: Set<string>;
  // No list of addresses with an account elsewhere: a row for such an address gets exactly the
  // answer an unknown address gets, so a preview cannot probe other organizations. Acceptance
  // resolves it (lib/team/invites.ts acceptInvite).
  /** lower-cased e-mails with an open invitation in this organization */
  pending: Set<string>;
  seats: number;
  /** seats taken now: active members + open invitations */
  used: number;
};

/** the English text of a row message (what `problems` and `notes` hold) */
export const rosterMessageEnglish = (m: RosterMessage) => englishOf(`bulk.row.${m.key}`, m.values);

export type CheckedRow = RawRosterRow & {
  /** in English; `problemMessages` / `noteMessages` carry the same as catalog keys for other languages */
  problems: string[];
  notes: string[];
  problemMessages: RosterMessage[];
  noteMessages: RosterMessage[];
  teamId: string | null;
  roleValue: InviteRole | null;
};

const emailCheck = z.string().email();

/** Names every problem of every row; rows without problems are the ones an import writes. */
export function checkRoster(raw: RawRosterRow[], ctx: RosterContext): CheckedRow[] {
  const firstLine = new Map<string, number>();
  let free = Math.max(0, ctx.seats - ctx.used);
  const teamList = [...ctx.teams.values()].map((t) => t.name);
  return raw.map((r) => {
    const problemMessages: RosterMessage[] = [];
    const noteMessages: RosterMessage[] = [];
    const problem = (key: string, values: Record<string, string> = {}) => problemMessages.push({ key, values });
    const email = r.email.toLowerCase();
    if (!r.email) problem("emailMissing");
    else if (email.length > 255 || !emailCheck.safeParse(email).success) problem("badEmail", { email: r.email });
    const roleText = r.role.toLowerCase();
    const roleValue = roleText === "" ? "learner" : (INVITE_ROLES as readonly string[]).includes(roleText) ? (roleText as InviteRole) : null;
    if (!roleValue) problem("unknownRole", { role: r.role });
    let teamId: string | null = null;
    if (r.team) {
      const t = ctx.teams.get(r.team.toLowerCase());
      if (t) teamId = t.id;
      else if (teamList.length) problem("unknownTeam", { team: r.team, teams: `${teamList.slice(0, 8).join(", ")}${teamList.length > 8 ? ", …" : ""}` });
      else problem("unknownTeamNone", { team: r.team });
    }
    if (r.name.length > 200) problem("nameTooLong");
    if (email && !problemMessages.some((p) => p.key === "badEmail")) {
      const seen = firstLine.get(email);
      if (seen !== undefined) problem("duplicate", { line: String(seen) });
      else firstLine.set(email, r.line);
      if (ctx.members.has(email)) problem("alreadyMember", { org: ctx.orgName });
    }
    if (problemMessages.length === 0) {
      if (ctx.pending.has(email)) noteMessages.push({ key: "openInvitation", values: {} });
      else if (free > 0) free--;
      else problem("overSeats", { seats: String(ctx.seats) });
    }
    const problems = problemMessages.map(rosterMessageEnglish);
    const notes = noteMessages.map(rosterMessageEnglish);
    return { ...r, email: r.email, problems, notes, problemMessages, noteMessages, teamId, roleValue };
  });
}

/**
 * Template CSV: header and two example rows with the organization's own team names. A company
 * without teams yet gets rows with the team left empty, so the template imports as it is.
 */
export function rosterTemplate(teamNames: string[]): string {
  const [a = "", b = a] = teamNames;
  return csvLines([[...ROSTER_COLUMNS], ["new.installer@example.com", "Ruel Tamberlin", "learner", a], ["crew.lead@example.com", "Odile Vassmer", "manager", b]]);
}
