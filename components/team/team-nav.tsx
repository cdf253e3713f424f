import Link from "next/link";

const TABS = [
  { href: "/team", label: "Board" },
  { href: "/team/teams", label: "Teams" },
  { href: "/team/invite", label: "Invite people" },
  { href: "/team/assign", label: "Assign work" },
  { href: "/team/sign-offs", label: "Sign-offs" },
];

/** Sub-navigation of the manager's pages; keeps ?org= for admins. */
export function TeamNav({ current, org }: { current: string; org?: string | null }) {
  const q = org ? `?org=${encodeURIComponent(org)}` : "";
  return (
    <nav aria-label="Team pages" className="mb-6 flex flex-wrap gap-2 border-b border-line pb-2">
      {TABS.map((t) => (
        <Link
          key={t.href}
          href={`${t.href}${q}`}
          aria-current={current === t.href ? "page" : undefined}
          className={`rounded px-3 py-2 font-bold no-underline ${current === t.href ? "bg-ink text-paper" : "text-ink hover:bg-panel"}`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
