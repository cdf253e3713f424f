"use client";
import { useTranslations } from "next-intl";
import Link from "next/link";
import { usePathname } from "next/navigation";

export const ADMIN_SECTIONS = [
  { href: "/admin", label: "overview" },
  { href: "/admin/organizations", label: "organizations" },
  { href: "/admin/people", label: "people" },
  { href: "/admin/content", label: "content" },
  { href: "/admin/mail", label: "mail" },
  { href: "/admin/audit", label: "audit" },
  { href: "/admin/jobs", label: "jobs" },
] as const;

export function AdminNav() {
  const t = useTranslations("admin");
  const pathname = usePathname();
  return (
    <nav aria-label={t("nav.label")} className="mb-6 border-b border-line">
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
                {t(`nav.${s.label}`)}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
