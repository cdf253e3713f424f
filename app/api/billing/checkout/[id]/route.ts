import { ApiError, json, route } from "@/lib/api";
import { checkoutFor } from "@/lib/billing";

/** GET /api/billing/checkout/:id → its status (the success page polls this until the webhook arrives). */
export const GET = route<{ id: string }>("manager", async ({ viewer, params }) => {
  const found = await checkoutFor(viewer, params.id);
  if (!found) throw new ApiError(404, "No such checkout.");
  return json(found);
});
