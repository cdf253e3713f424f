import "server-only";
/**
 * A whole team's training histories as one ZIP: each current member's PDF and CSV, streamed as the
 * files are made (fflate's streaming Zip; PDFs are stored as they are, already compressed; CSVs are
 * deflated). Only a manager of the team's organization (or an admin) gets it: unknown team → 404,
 * another organization's → 403. A team over TEAM_ZIP_MAX_PEOPLE gets a 413 before any work.
 */
import { and, asc, eq } from "drizzle-orm";
import { Zip, ZipDeflate, ZipPassThrough } from "fflate";
import { db } from "@/db/client";
import { organization, user } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { teamForViewer } from "@/lib/team";
import { trainingHistory } from "./history";
import { historyCsv } from "./history-csv";
import { renderHistoryPdf } from "./history-pdf";

/** Each PDF takes a fraction of a second to draw; past this a request would run for minutes. */
export const TEAM_ZIP_MAX_PEOPLE = 60;

const slug = (s: string, fallback: string) =>
  s
    .normalize("NFKD")
    .replace(/[^A-Za-z0-9]+/g, "-")
    .replace(/^-|-$/g, "")
    .toLowerCase()
    .slice(0, 60) || fallback;

/** A member's file name inside the ZIP: slugified name and id (no path characters, never clashing). */
export const memberFileName = (p: { id: string; name: string }, ext: "pdf" | "csv") => `${slug(p.name, "person")}-${slug(p.id, "id")}.${ext}`;

export async function teamHistoryZip(viewer: Viewer, teamId: string, now = new Date()): Promise<Response> {
  const t = await teamForViewer(viewer, teamId);
  const people = await db
    .select({ id: user.id, name: user.name, organizationId: user.organizationId, organizationName: organization.name })
    .from(user)
    .leftJoin(organization, eq(organization.id, user.organizationId))
    .where(and(eq(user.teamId, t.id), eq(user.organizationId, t.organizationId)))
    .orderBy(asc(user.name), asc(user.id))
    .limit(TEAM_ZIP_MAX_PEOPLE + 1);
  if (people.length === 0) throw new DomainError("conflict", `“${t.name}” has no people yet: there is no training history to download.`);
  if (people.length > TEAM_ZIP_MAX_PEOPLE) {
    throw new DomainError(
      "too-large",
      `“${t.name}” has more than ${TEAM_ZIP_MAX_PEOPLE} people: one ZIP would take too long to make. Download each person's training history from their page, or split the team.`,
    );
  }

  const body = new ReadableStream<Uint8Array>({
    async start(controller) {
      const zip = new Zip((err, chunk, final) => {
        if (err) return controller.error(err);
        controller.enqueue(chunk);
        if (final) controller.close();
      });
      const add = (name: string, data: Uint8Array, compress: boolean) => {
        const f = compress ? new ZipDeflate(name, { level: 6 }) : new ZipPassThrough(name);
        f.mtime = now;
        zip.add(f);
        f.push(data, true);
      };
      try {
        for (const p of people) {
          const h = await trainingHistory(p, now);
          add(memberFileName(p, "pdf"), await renderHistoryPdf(h), false);
          add(memberFileName(p, "csv"), new TextEncoder().encode(historyCsv(h)), true);
        }
        zip.end();
      } catch (err) {
        zip.terminate();
        controller.error(err);
      }
    },
  });
  return new Response(body, {
    headers: {
      "Content-Type": "application/zip",
      "Content-Disposition": `attachment; filename="riser-training-history-team-${slug(t.name, "team")}-${now.toISOString().slice(0, 10)}.zip"`,
      "Cache-Control": "private, no-store",
    },
  });
}
