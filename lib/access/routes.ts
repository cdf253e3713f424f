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
  { route: "/modules/[module]/quiz", rule: "signed-in", sample: "/modules/freeze-protection/quiz" },
  { route: "/api/quiz/attempts", rule: "signed-in" },
  { route: "/api/quiz/attempts/[id]", rule: "signed-in", sample: "/api/quiz/attempts/00000000-0000-0000-0000-000000000000", okStatus: 404 },
  { route: "/api/quiz/attempts/[id]/answers", rule: "signed-in", sample: "/api/quiz/attempts/00000000-0000-0000-0000-000000000000/answers", method: "PUT", okStatus: 400 },
  { route: "/api/quiz/attempts/[id]/submit", rule: "signed-in", sample: "/api/quiz/attempts/00000000-0000-0000-0000-000000000000/submit", method: "POST", okStatus: 404 },
  { route: "/tools", rule: "signed-in" },
  { route: "/tools/[calculator]", rule: "signed-in", sample: "/tools/flow-test" },
  { route: "/api/tools/summary", rule: "signed-in", method: "POST", okStatus: 400 },
  { route: "/reference", rule: "signed-in" },
  { route: "/reference/[card]", rule: "signed-in", sample: "/reference/antifreeze-systems" },
  { route: "/glossary", rule: "signed-in" },
  { route: "/search", rule: "signed-in" },
  { route: "/api/health", rule: "public" },
  { route: "/api/health/live", rule: "public" },
  // readiness details and metrics need the bearer METRICS_SECRET: 401 for every role without it
  { route: "/api/health/ready", rule: "public", okStatus: 401 },
  { route: "/api/metrics", rule: "public", okStatus: 401 },
  { route: "/api/search", rule: "signed-in", sample: "/api/search?q=sidewall" },
  { route: "/api/progress", rule: "signed-in", sample: "/api/progress?module=freeze-protection" },
  // job-site mode: the /offline page is static (the list comes from the phone's own storage)
  { route: "/offline", rule: "public" },
  { route: "/sw.js", rule: "public" },
  { route: "/api/offline/modules/[module]", rule: "signed-in", sample: "/api/offline/modules/freeze-protection" },
  { route: "/api/offline/versions", rule: "signed-in" },
  { route: "/api/auth/[...all]", rule: "public", sample: "/api/auth/get-session" },
  { route: "/api/account/sign-up", rule: "public", method: "POST", okStatus: 400 },
  // the language switch works before sign-in (a cookie) and after (the account too)
  { route: "/api/account/language", rule: "public", method: "POST", okStatus: 400 },
  // account settings
  { route: "/account", rule: "signed-in" },
  { route: "/api/account/sessions", rule: "signed-in" },
  { route: "/api/account/records", rule: "signed-in", sample: "/api/account/records?format=json" },
  // admin console
  { route: "/admin", rule: "admin" },
  { route: "/admin/organizations", rule: "admin" },
  { route: "/admin/people", rule: "admin" },
  { route: "/admin/content", rule: "admin" },
  { route: "/admin/mail", rule: "admin" },
  { route: "/admin/audit", rule: "admin" },
  { route: "/admin/jobs", rule: "admin" },
  { route: "/api/admin/organizations", rule: "admin" },
  { route: "/api/admin/organizations", rule: "admin", method: "POST", okStatus: 400 },
  { route: "/api/admin/organizations/[id]", rule: "admin", sample: "/api/admin/organizations/no-such-org", method: "POST", okStatus: 400 },
  { route: "/api/admin/people", rule: "admin", sample: "/api/admin/people?role=learner&sort=email&dir=desc" },
  { route: "/api/admin/people/[id]/role", rule: "admin", sample: "/api/admin/people/no-such-person/role", method: "POST", okStatus: 400 },
  { route: "/api/admin/people/[id]/organization", rule: "admin", sample: "/api/admin/people/no-such-person/organization", method: "POST", okStatus: 400 },
  { route: "/api/admin/people/[id]/ban", rule: "admin", sample: "/api/admin/people/no-such-person/ban", method: "POST", okStatus: 400 },
  { route: "/api/admin/people/[id]/unban", rule: "admin", sample: "/api/admin/people/no-such-person/unban", method: "POST", okStatus: 404 },
  { route: "/api/admin/people/[id]/sign-out", rule: "admin", sample: "/api/admin/people/no-such-person/sign-out", method: "POST", okStatus: 404 },
  { route: "/api/admin/content", rule: "admin" },
  { route: "/api/admin/content/sync", rule: "admin", method: "POST" },
  { route: "/api/admin/mail", rule: "admin", sample: "/api/admin/mail?status=sent" },
  { route: "/api/admin/audit", rule: "admin", sample: "/api/admin/audit?action=content.sync" },
  { route: "/api/admin/audit/export", rule: "admin" },
  // certificates: ids/codes in samples do not exist, so allowed viewers get 404;
  // revoke with body {} → 400 (reason required); the jobs route without x-jobs-secret → 401.
  { route: "/certificates", rule: "signed-in" },
  { route: "/verify", rule: "public" },
  { route: "/verify/[code]", rule: "public", sample: "/verify/not-a-code", okStatus: 404 },
  { route: "/api/verify/[code]", rule: "public", sample: "/api/verify/not-a-code", okStatus: 404 },
  { route: "/api/certificates/[id]/pdf", rule: "signed-in", sample: "/api/certificates/0/pdf", okStatus: 404 },
  { route: "/api/certificates/[id]/revoke", rule: "manager", sample: "/api/certificates/0/revoke", method: "POST", okStatus: 400 },
  { route: "/api/jobs/certificate-reminders", rule: "public", method: "POST", okStatus: 401 },
  // portable credentials: keys, issuer, status lists and each certificate's credential are public
  // (the credential by its verification code only; the sample code does not exist → 404).
  { route: "/.well-known/jwks.json", rule: "public" },
  { route: "/.well-known/did.json", rule: "public" },
  { route: "/api/credentials/issuer", rule: "public" },
  { route: "/api/credentials/status/[list]", rule: "public", sample: "/api/credentials/status/1" },
  { route: "/api/verify/[code]/credential", rule: "public", sample: "/api/verify/not-a-code/credential", okStatus: 404 },
  // training history downloads (PDF by default); the person sample does not exist → 404 for managers
  // and admins; the reporting-period POST {} → 400 (fields missing)
  { route: "/api/account/training-history", rule: "signed-in", sample: "/api/account/training-history?format=csv" },
  { route: "/api/team/people/[id]/training-history", rule: "manager", sample: "/api/team/people/00000000-0000-4000-8000-000000000000/training-history", okStatus: 404 },
  { route: "/api/team/teams/[id]/training-history", rule: "manager", sample: "/api/team/teams/00000000-0000-4000-8000-000000000000/training-history", okStatus: 404 },
  { route: "/api/team/reporting-period", rule: "manager" },
  { route: "/api/team/reporting-period", rule: "manager", method: "POST", okStatus: 400 },
  // practical sign-offs: POST {} as JSON → 400 (a multipart form is required / decision
  // missing); the evidence sample names no stored file → 404 for everyone allowed to ask.
  { route: "/modules/[module]/sign-offs", rule: "signed-in", sample: "/modules/pipe-and-joining/sign-offs" },
  { route: "/team/sign-offs", rule: "manager" },
  { route: "/api/sign-offs", rule: "signed-in", method: "POST", okStatus: 400 },
  { route: "/api/sign-offs/[id]/review", rule: "manager", sample: "/api/sign-offs/00000000-0000-4000-8000-000000000000/review", method: "POST", okStatus: 400 },
  {
    route: "/api/sign-offs/[id]/evidence/[evidenceId]",
    rule: "signed-in",
    sample: "/api/sign-offs/00000000-0000-4000-8000-000000000000/evidence/00000000-0000-4000-8000-000000000000?thumb=1",
    okStatus: 404,
  },
  // seats and billing: learners get 403 everywhere here. The webhook is public (the
  // signature is its proof): with body {} and no signature it answers 400.
  { route: "/team/billing", rule: "manager" },
  { route: "/team/billing/success", rule: "manager" },
  { route: "/team/billing/cancel", rule: "manager" },
  { route: "/api/billing", rule: "manager" },
  { route: "/api/billing/checkout", rule: "manager", method: "POST", okStatus: 400 },
  { route: "/api/billing/checkout/[id]", rule: "manager", sample: "/api/billing/checkout/00000000-0000-0000-0000-000000000000", okStatus: 404 },
  { route: "/api/billing/webhook", rule: "public", method: "POST", okStatus: 400 },
  // team training management: POST {} → 400 (fields or the file missing); the person
  // and assignment samples do not exist → 404 for managers and admins; the invite sample token is
  // not valid → the public refusal page (200); the jobs route without x-jobs-secret → 401.
  { route: "/team", rule: "manager" },
  { route: "/team/assign", rule: "manager" },
  { route: "/team/invite", rule: "manager" },
  { route: "/team/people/[id]", rule: "manager", sample: "/team/people/00000000-0000-4000-8000-000000000000", okStatus: 404 },
  { route: "/invite/[token]", rule: "public", sample: "/invite/not-a-real-invitation-token" },
  { route: "/api/invite/accept", rule: "public", method: "POST", okStatus: 400 },
  { route: "/api/team/invites", rule: "manager", method: "POST", okStatus: 400 },
  { route: "/api/team/invites/preview", rule: "manager", method: "POST", okStatus: 400 },
  { route: "/api/team/invites/import", rule: "manager", method: "POST", okStatus: 400 },
  { route: "/api/team/invites/template.csv", rule: "manager" },
  { route: "/api/team/assignments", rule: "manager", method: "POST", okStatus: 400 },
  { route: "/api/team/assignments/[id]", rule: "manager", sample: "/api/team/assignments/0", method: "DELETE", okStatus: 404 },
  { route: "/api/team/board", rule: "manager", sample: "/api/team/board?page=1&pageSize=10" },
  { route: "/api/team/board.csv", rule: "manager" },
  { route: "/api/team/certificates.csv", rule: "manager" },
  { route: "/api/team/people", rule: "manager", sample: "/api/team/people?q=a" },
  { route: "/api/team/summary", rule: "manager" },
  { route: "/api/jobs/run", rule: "public", method: "POST", okStatus: 401 },
  // running a crew: teams, people, invitations. POST {} → 400 (nothing to change); ids in samples
  // do not exist → 404 for managers and admins (admins without ?org= get 400: choose the organization).
  { route: "/team/teams", rule: "manager" },
  { route: "/api/team/teams", rule: "manager", sample: "/api/team/teams", okStatus: 200 },
  { route: "/api/team/security", rule: "manager" },
  { route: "/api/team/security", rule: "manager", method: "POST", okStatus: 400 },
  { route: "/api/team/language", rule: "manager" },
  { route: "/api/team/language", rule: "manager", method: "POST", okStatus: 400 },
  { route: "/api/team/teams", rule: "manager", method: "POST", okStatus: 400 },
  { route: "/api/team/teams/[id]", rule: "manager", sample: "/api/team/teams/00000000-0000-4000-8000-000000000000", method: "POST", okStatus: 400 },
  { route: "/api/team/people/[id]", rule: "manager", sample: "/api/team/people/00000000-0000-4000-8000-000000000000", method: "POST", okStatus: 400 },
  { route: "/api/team/people/[id]/remove", rule: "manager", sample: "/api/team/people/00000000-0000-4000-8000-000000000000/remove", method: "POST", okStatus: 404 },
  { route: "/api/team/invites", rule: "manager" },
  { route: "/api/team/invites/[id]/resend", rule: "manager", sample: "/api/team/invites/00000000-0000-4000-8000-000000000000/resend", method: "POST", okStatus: 404 },
  { route: "/api/team/invites/[id]/assign", rule: "manager", sample: "/api/team/invites/00000000-0000-4000-8000-000000000000/assign", method: "POST", okStatus: 400 },
  { route: "/api/team/invites/[id]/revoke", rule: "manager", sample: "/api/team/invites/00000000-0000-4000-8000-000000000000/revoke", method: "POST", okStatus: 404 },
  // adopted code: jurisdictions with their NFPA 13D edition, and local rules per topic. POST {} → 400;
  // the id sample does not exist → 404; DELETE of a topic without a rule → 404 (admins without ?org= → 400).
  { route: "/team/code", rule: "manager" },
  { route: "/api/team/jurisdictions", rule: "manager" },
  { route: "/api/team/jurisdictions", rule: "manager", method: "POST", okStatus: 400 },
  { route: "/api/team/jurisdictions/[id]", rule: "manager", sample: "/api/team/jurisdictions/00000000-0000-4000-8000-000000000000", method: "DELETE", okStatus: 404 },
  { route: "/api/team/amendments", rule: "manager", method: "POST", okStatus: 400 },
  { route: "/api/team/amendments/[topic]", rule: "manager", sample: "/api/team/amendments/no-such-topic", method: "DELETE", okStatus: 404 },
  // refreshers after material content changes: POST {} → 400 (module missing)
  { route: "/api/refreshers", rule: "signed-in" },
  { route: "/api/refreshers", rule: "signed-in", method: "POST", okStatus: 400 },
];
