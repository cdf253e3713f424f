/**
 * Every route of the app with its access rule. The role-matrix test walks app/ and fails when a
 * page or route handler is missing here, then requests each one as every role.
 * `sample` fills dynamic segments; `method`/`okStatus` say what an allowed request should get.
 */
import type { Rule } from "./rules";

export type RouteEntry = {
  route: string;
  rule: Rule;
  sample?: string;
  method?: "GET" | "POST" | "PUT" | "DELETE";
  /** status an allowed viewer gets for the sample request (default 200) */
  okStatus?: number;
};

export const ROUTES: RouteEntry[] = [
  { route: "/", rule: "public" },
  { route: "/sign-in", rule: "public" },
  { route: "/sign-up", rule: "public" },
  { route: "/forgot-password", rule: "public" },
  { route: "/reset-password", rule: "public" },
  { route: "/dev/mail", rule: "public" },
  { route: "/learn", rule: "signed-in" },
  { route: "/modules", rule: "signed-in" },
  { route: "/modules/[module]", rule: "signed-in", sample: "/modules/freeze-protection" },
  { route: "/modules/[module]/[lesson]", rule: "signed-in", sample: "/modules/freeze-protection/where-homes-freeze" },
  { route: "/reference", rule: "signed-in" },
  { route: "/reference/[card]", rule: "signed-in", sample: "/reference/antifreeze-systems" },
  { route: "/glossary", rule: "signed-in" },
  { route: "/search", rule: "signed-in" },
  { route: "/api/health", rule: "public" },
  { route: "/api/search", rule: "signed-in", sample: "/api/search?q=sidewall" },
  { route: "/api/progress", rule: "signed-in", sample: "/api/progress?module=freeze-protection" },
  { route: "/api/auth/[...all]", rule: "public", sample: "/api/auth/get-session" },
  { route: "/api/account/sign-up", rule: "public", method: "POST", okStatus: 400 },
];
