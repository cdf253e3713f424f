import "server-only";
import { AsyncLocalStorage } from "node:async_hooks";

/**
 * Who a new account belongs to. Riser's own routes (sign-up, invite acceptance) create accounts
 * inside `signupContext.run(...)`; better-auth's create hook reads it. A sign-up that arrives at
 * better-auth's raw endpoint without it is refused, so nobody can place themselves in an
 * organization or pick a role.
 */
export type SignupPlacement = {
  organizationId: string;
  teamId: string | null;
  role: "learner" | "sales" | "manager";
  /** true only for invite acceptance: opening the mailed link proved the address (no confirm mail) */
  emailVerified?: true;
  /** the new account's language: the language the sign-up form was filled in (lib/i18n LOCALES) */
  language?: "en" | "es";
};
export const signupContext = new AsyncLocalStorage<SignupPlacement>();
