import "server-only";
import Link from "next/link";
import { getTranslations } from "next-intl/server";
import { getViewer } from "@/lib/access";
import { waitingCount } from "@/lib/signoffs";

const TABS = [
  { href: "/team", label: "board" },
  { href: "/team/teams", label: "teams" },
  { href: "/team/invite", label: "invite" },
  { href: "/team/assign", label: "assign" },
  { href: "/team/sign-offs", label: "signoffs" },
  { href: "/team/code", label: "code" },
];

/** Sub-navigation of the manager's pages; keeps ?org= for admins; the Sign-offs tab counts what waits for review. */
export async function TeamNav({ current, org }: { current: string; org?: string | null }) {
  const q = org ? `?org=${encodeURIComponent(org)}` : "";
  const viewer = await getViewer();
  const tr = await getTranslations("team");
  const waiting = viewer ? await waitingCount(viewer, org ?? null) : 0;
  return (
    <nav aria-label={tr("nav.label")} className="mb-6 flex flex-wrap gap-2 border-b border-line pb-2">
      {TABS.map((t) => (
        <Link
          key={t.href}
          href={`${t.href}${q}`}
          aria-current={current === t.href ? "page" : undefined}
          className={`rounded px-3 py-2 font-bold no-underline ${current === t.href ? "bg-ink text-paper" : "text-ink hover:bg-panel"}`}
        >
          {tr(`nav.${t.label}`)}
          {t.href === "/team/sign-offs" && waiting > 0 ? (
            <span className="ml-1.5 inline-flex min-w-6 items-center justify-center rounded-full bg-copper px-1.5 text-xs text-white" data-testid="sign-offs-waiting">
              {waiting}
              <span className="sr-only">{tr("nav.waiting")}</span>
            </span>
          ) : null}
        </Link>
      ))}
    </nav>
  );
}
