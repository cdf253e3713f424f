"use client";
import { createAuthClient } from "better-auth/react";
import { adminClient, twoFactorClient } from "better-auth/client/plugins";

/** The browser's auth client: same origin, so no base URL. The sign-in form handles the second step itself. */
export const authClient = createAuthClient({ plugins: [adminClient(), twoFactorClient()] });
