import type { Role } from "@/lib/access/browser";

export type NavItem = { href: string; label: string; rule: "signed-in" | "manager" | "admin" };

/** Navigation by role; the server checks every route again (lib/access). */
export const NAV_ITEMS: NavItem[] = [
  { href: "/learn", label: "My training", rule: "signed-in" },
  { href: "/modules", label: "Modules", rule: "signed-in" },
  { href: "/reference", label: "Code cards", rule: "signed-in" },
  { href: "/tools", label: "Calculators", rule: "signed-in" },
  { href: "/search", label: "Search", rule: "signed-in" },
  { href: "/certificates", label: "Certificates", rule: "signed-in" },
  { href: "/team", label: "Team", rule: "manager" },
  { href: "/admin", label: "Admin", rule: "admin" },
];

export function navFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((i) => i.rule === "signed-in" || (i.rule === "manager" ? role === "manager" || role === "admin" : role === "admin"));
}

/**
 * Links for someone signed out. An invitation page offers no "Create an account": the invited
 * person's account comes from the invitation, and a separate sign-up would make a second company.
 */
export function signedOutLinks(pathname: string | null): { href: string; label: string }[] {
  const links = [{ href: "/sign-in", label: "Sign in" }];
  if (!pathname?.startsWith("/invite/")) links.push({ href: "/sign-up", label: "Create an account" });
  return links;
}
