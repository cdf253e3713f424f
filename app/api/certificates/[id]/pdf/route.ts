import { route } from "@/lib/api";
import { certificateForViewer, certificatePdf } from "@/lib/certificates";

/** GET /api/certificates/:id/pdf → the certificate PDF (holder, their organization's managers, admins). */
export const GET = route<{ id: string }>("signed-in", async ({ viewer, params }) => {
  const cert = await certificateForViewer(viewer, params.id);
  const { bytes, fileName } = await certificatePdf(cert);
  return new Response(bytes as BodyInit, {
    status: 200,
    headers: {
      "Content-Type": "application/pdf",
      "Content-Disposition": `attachment; filename="${fileName}"`,
      "Content-Length": String(bytes.byteLength),
      "Cache-Control": "private, no-store",
    },
  });
});
