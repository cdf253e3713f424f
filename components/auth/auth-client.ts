"use client";
import { createAuthClient } from "better-auth/react";
import { adminClient } from "better-auth/client/plugins";

/** The browser's auth client: same origin, so no base URL. */
export const authClient = createAuthClient({ plugins: [adminClient()] });
