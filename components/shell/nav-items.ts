import type { Role } from "@/lib/access/browser";

/** `key` names the label in messages/<locale>/shell.json (nav.<key>). */
export type NavItem = { href: string; key: string; rule: "signed-in" | "manager" | "admin" };

/** Navigation by role; the server checks every route again (lib/access). */
export const NAV_ITEMS: NavItem[] = [
  { href: "/learn", key: "learn", rule: "signed-in" },
  { href: "/modules", key: "modules", rule: "signed-in" },
  { href: "/reference", key: "reference", rule: "signed-in" },
  { href: "/tools", key: "tools", rule: "signed-in" },
  { href: "/search", key: "search", rule: "signed-in" },
  { href: "/certificates", key: "certificates", rule: "signed-in" },
  { href: "/team", key: "team", rule: "manager" },
  { href: "/admin", key: "admin", rule: "admin" },
];

export function navFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((i) => i.rule === "signed-in" || (i.rule === "manager" ? role === "manager" || role === "admin" : role === "admin"));
}

/**
 * Links for someone signed out. An invitation page offers no "Create an account": the invited
 * person's account comes from the invitation, and a separate sign-up would make a second company.
 */
export function signedOutLinks(pathname: string | null): { href: string; key: "signIn" | "createAccount" }[] {
  const links: { href: string; key: "signIn" | "createAccount" }[] = [{ href: "/sign-in", key: "signIn" }];
  if (!pathname?.startsWith("/invite/")) links.push({ href: "/sign-up", key: "createAccount" });
  return links;
}
