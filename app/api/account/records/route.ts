import { z } from "zod";
import { ApiError, json, route } from "@/lib/api";
import { collectMyRecords, recordsCsv } from "@/lib/account";
import { csvDownload } from "@/lib/csv";

const format = z.enum(["json", "csv"]);

/** GET /api/account/records?format=json|csv → the viewer's own lessons, attempts, completions, certificates and sign-offs. */
export const GET = route("signed-in", async ({ req, viewer }) => {
  const parsed = format.safeParse(new URL(req.url).searchParams.get("format") ?? "json");
  if (!parsed.success) throw new ApiError(400, "Ask for format=json or format=csv.");
  const records = await collectMyRecords(viewer.id);
  const day = records.generatedAt.slice(0, 10);
  const filename = `riser-my-records-${day}.${parsed.data}`;
  if (parsed.data === "json") {
    return json(records, { headers: { "content-disposition": `attachment; filename="${filename}"` } });
  }
  return csvDownload(filename, recordsCsv(records));
});
