import { clientIp, json, readJson, route } from "@/lib/api";
import { jurisdictionUpdateSchema, removeJurisdiction, updateJurisdiction } from "@/lib/editions";

/** POST /api/team/jurisdictions/[id] { name?, state?, edition?, ircP2904?, isDefault? }; unknown → 404, another organization's → 403. */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const input = await readJson(req, jurisdictionUpdateSchema);
  await updateJurisdiction(viewer, params.id, input, clientIp(req));
  return json({ ok: true, message: "Saved." });
});

/** DELETE /api/team/jurisdictions/[id] → removed (the oldest remaining one becomes the default). */
export const DELETE = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const r = await removeJurisdiction(viewer, params.id, clientIp(req));
  return json({ ok: true, message: `${r.name} removed.` });
});
