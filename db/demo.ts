/** The invented demo scenario. Used by the seed and by tests that sign in as demo people. */
export const DEMO_PASSWORD = "riser-demo-2026";
/**
 * The demo admin's authenticator secret (admins must use two-step sign-in). Local demo data only, as
 * published as the password; README gives it in the base32 form authenticator apps take.
 */
export const DEMO_ADMIN_TOTP_SECRET = "riser-demo-admin-authenticator";

export const DEMO_ORGS = [
  { key: "quillmoor", name: "Quillmoor Fire Protection", kind: "contractor", seats: 25, teams: ["North crew", "South crew", "Design office"] },
  { key: "larkhaven", name: "Larkhaven Homes", kind: "builder", seats: 10, teams: ["Juniper Flats sales office"] },
] as const;

/** `language`: the person's language for pages and mail (absent = English) */
export type DemoPerson = { name: string; email: string; role: "learner" | "sales" | "manager" | "admin"; org: "quillmoor" | "larkhaven" | null; team: string | null; language?: "en" | "es" };

export const DEMO_PEOPLE: DemoPerson[] = [
  { name: "Maren Ostrowe", email: "maren@quillmoor.example", role: "manager", org: "quillmoor", team: null },
  { name: "Dario Feltham", email: "dario@quillmoor.example", role: "learner", org: "quillmoor", team: "North crew" },
  { name: "Ines Carrow", email: "ines@quillmoor.example", role: "learner", org: "quillmoor", team: "North crew" },
  { name: "Tobin Reyl", email: "tobin@quillmoor.example", role: "learner", org: "quillmoor", team: "North crew" },
  { name: "Kasimir Dunleavy", email: "kasimir@quillmoor.example", role: "learner", org: "quillmoor", team: "South crew" },
  { name: "Odette Brannock", email: "odette@quillmoor.example", role: "learner", org: "quillmoor", team: "South crew", language: "es" },
  { name: "Wendell Ashcombe", email: "wendell@quillmoor.example", role: "learner", org: "quillmoor", team: "South crew" },
  { name: "Rafaela Quint", email: "rafaela@quillmoor.example", role: "learner", org: "quillmoor", team: "South crew" },
  { name: "Callum Threlby", email: "callum@quillmoor.example", role: "learner", org: "quillmoor", team: "Design office" },
  { name: "Hollis Wren", email: "hollis@larkhaven.example", role: "manager", org: "larkhaven", team: null },
  { name: "Nadia Ferrow", email: "nadia@larkhaven.example", role: "sales", org: "larkhaven", team: "Juniper Flats sales office" },
  { name: "Ansel Merrow", email: "admin@riser.example", role: "admin", org: null, team: null },
];

export const demoByRole = (role: DemoPerson["role"], org?: DemoPerson["org"]) =>
  DEMO_PEOPLE.find((p) => p.role === role && (org === undefined || p.org === org))!;
