import { toNextJsHandler } from "better-auth/next-js";
import { auth } from "@/lib/auth";
import { errorResponse } from "@/lib/api";

const handlers = toNextJsHandler(auth);

// better-auth answers its own errors; a database outage still becomes a clear 503.
export async function GET(req: Request) {
  try {
    return await handlers.GET(req);
  } catch (err) {
    return errorResponse(err);
  }
}
export async function POST(req: Request) {
  try {
    return await handlers.POST(req);
  } catch (err) {
    return errorResponse(err);
  }
}
