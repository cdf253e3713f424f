import { clientIp, json, route } from "@/lib/api";
import { assertUploadAllowed, readUpload, submitSignOff } from "@/lib/signoffs";

/**
 * POST /api/sign-offs (multipart/form-data: module, skill, note, files ×1–3) → 201 { id, status, evidence }.
 * Any signed-in person, for themselves. Files are checked by content; photos lose their metadata.
 * 400 bad field, empty or damaged file, incomplete upload · 409 already waiting or signed off ·
 * 413 too large or over 40 megapixels · 415 not a JPEG/PNG/HEIC photo or a PDF · 429 over the
 * person's upload allowance (20 an hour) · 503 file store unreachable or photo decoding busy.
 */
export const POST = route("signed-in", async ({ req, viewer }) => {
  await assertUploadAllowed(viewer);
  const upload = await readUpload(req);
  const result = await submitSignOff(viewer, upload, clientIp(req));
  return json(result, 201);
});
