import { ApiError, route } from "@/lib/api";
import { evidenceFileForViewer } from "@/lib/signoffs";
import { getObject, isStorageDown } from "@/lib/storage";

/**
 * GET /api/sign-offs/:id/evidence/:evidenceId[?thumb=1][&download=1] → the stored file, streamed from
 * the object store after checking access (the learner, their organization's managers, admins).
 * PDFs always come as attachments.
 */
export const GET = route<{ id: string; evidenceId: string }>("signed-in", async ({ req, viewer, params }) => {
  const url = new URL(req.url);
  const file = await evidenceFileForViewer(viewer, params.id, params.evidenceId, url.searchParams.get("thumb") === "1");
  let obj;
  try {
    obj = await getObject(file.key);
  } catch (err) {
    if (isStorageDown(err)) throw new ApiError(503, "The file store is not reachable right now. Try again in a minute.");
    throw err;
  }
  if (!obj) throw new ApiError(404, "This file is missing from storage.");
  // A PDF is never shown inline on Riser's origin (a PDF viewer runs its scripts and links there):
  // always a download. Photos (re-encoded by sharp, metadata stripped) may show inline.
  const disposition = url.searchParams.get("download") === "1" || file.contentType === "application/pdf" ? "attachment" : "inline";
  const headers: Record<string, string> = {
    "Content-Type": file.contentType,
    "Content-Disposition": `${disposition}; filename="${file.name.replace(/[^\x20-\x7e]/g, "_")}"; filename*=UTF-8''${encodeURIComponent(file.name)}`,
    "Cache-Control": "private, no-store",
    "X-Content-Type-Options": "nosniff",
  };
  if (obj.size !== null) headers["Content-Length"] = String(obj.size);
  return new Response(obj.body, { status: 200, headers });
});
