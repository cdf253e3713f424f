/** Roles and access rules: plain data, importable anywhere (no server code). */
export const ROLES = ["learner", "sales", "manager", "admin"] as const;
export type Role = (typeof ROLES)[number];

/**
 * public: anyone · signed-in: any role · manager: managers (of their own organization) and admins ·
 * admin: admins only.
 */
export type Rule = "public" | "signed-in" | "manager" | "admin";

export function roleSatisfies(role: Role, rule: Rule): boolean {
  switch (rule) {
    case "public":
    case "signed-in":
      return true;
    case "manager":
      return role === "manager" || role === "admin";
    case "admin":
      return role === "admin";
  }
}

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}
