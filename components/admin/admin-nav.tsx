"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export const ADMIN_SECTIONS = [
  { href: "/admin", label: "Overview" },
  { href: "/admin/organizations", label: "Organizations" },
  { href: "/admin/people", label: "People" },
  { href: "/admin/content", label: "Content" },
  { href: "/admin/mail", label: "Mail log" },
  { href: "/admin/audit", label: "Audit log" },
  { href: "/admin/jobs", label: "Jobs" },
] as const;

export function AdminNav() {
  const pathname = usePathname();
  return (
    <nav aria-label="Admin sections" className="mb-6 border-b border-line">
      <ul className="-mb-px flex flex-wrap gap-x-1">
        {ADMIN_SECTIONS.map((s) => {
          const current = s.href === "/admin" ? pathname === "/admin" : pathname === s.href || pathname.startsWith(`${s.href}/`);
          return (
            <li key={s.href}>
              <Link
                href={s.href}
                aria-current={current ? "page" : undefined}
                className="inline-flex min-h-11 items-center border-b-4 border-transparent px-3 text-ink no-underline hover:border-line aria-[current=page]:border-copper aria-[current=page]:font-bold"
              >
                {s.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
