"use client";
import Link from "next/link";
import { usePathname, useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { useTranslations } from "next-intl";
import { OfflineSync } from "@/components/offline/offline-sync";
import { postJson } from "@/lib/fetcher";
import { isRole } from "@/lib/access/browser";
import { flushQueue, forgetEverything, listQueue, offlineSupported } from "@/lib/offline/browser";
import { navFor, signedOutLinks } from "./nav-items";

type NavSession = { user: { id: string; name: string; role?: string } } | null;

/**
 * The header's menu for whoever is signed in. It asks better-auth's session endpoint directly (on
 * every page change, answered from the signed session copy without a database read) instead of
 * loading the auth client library into every page's first-load JavaScript.
 */
export function SiteNav() {
  const t = useTranslations("shell");
  const pathname = usePathname();
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [data, setData] = useState<NavSession>(null);
  const [isPending, setPending] = useState(true);
  useEffect(() => {
    let live = true;
    fetch("/api/auth/get-session", { cache: "no-store" })
      .then((r) => (r.ok ? (r.json() as Promise<NavSession>) : null))
      .catch(() => null)
      .then((s) => {
        if (!live) return;
        setData(s?.user ? s : null);
        setPending(false);
      });
    return () => {
      live = false;
    };
  }, [pathname]);
  const role = data?.user.role;
  const items = data ? navFor(isRole(role) ? role : "learner") : [];

  async function signOut() {
    // Kept lessons and queued marks are personal: send what can be sent, then forget them all
    // (the sign-out answer also carries Clear-Site-Data for the same reason).
    if (offlineSupported()) {
      if (navigator.onLine) await flushQueue().catch(() => undefined);
      const left = await listQueue().catch(() => []);
      if (left.length && !window.confirm(t("unsentMarks", { count: left.length }))) return;
      await forgetEverything();
    }
    await postJson("/api/auth/sign-out", {});
    setData(null);
    router.push("/");
    router.refresh();
  }

  return (
    <nav aria-label={t("mainNav")} className="flex flex-1 flex-wrap items-center justify-end gap-2">
      <OfflineSync userId={data?.user.id ?? null} />
      {isPending ? (
        <span className="text-sm text-paper/70">{t("loading")}</span>
      ) : data ? (
        <>
          <button
            type="button"
            className="rounded border border-paper/40 px-3 py-1 text-sm sm:hidden"
            aria-expanded={open}
            aria-controls="main-nav-list"
            onClick={() => setOpen((o) => !o)}
          >
            {t("menu")}
          </button>
          <ul id="main-nav-list" className={`${open ? "flex" : "hidden"} w-full flex-col gap-1 sm:flex sm:w-auto sm:flex-row sm:flex-wrap sm:gap-4`} data-testid="main-nav">
            {items.map((i) => (
              <li key={i.href}>
                <Link
                  href={i.href}
                  aria-current={pathname === i.href || pathname.startsWith(`${i.href}/`) ? "page" : undefined}
                  className="block py-1 text-paper no-underline hover:underline aria-[current=page]:underline aria-[current=page]:decoration-2"
                  onClick={() => setOpen(false)}
                >
                  {t(`nav.${i.key}`)}
                </Link>
              </li>
            ))}
            <li className="flex items-center gap-3 sm:ml-2 sm:border-l sm:border-paper/30 sm:pl-4">
              <Link href="/account" className="py-1 text-sm text-paper/90">{data.user.name}</Link>
              <button type="button" onClick={signOut} className="rounded border border-paper/40 px-2 py-0.5 text-sm hover:bg-paper hover:text-ink">
                {t("signOut")}
              </button>
            </li>
          </ul>
        </>
      ) : (
        <ul className="flex gap-4">
          {signedOutLinks(pathname).map((l) => (
            <li key={l.href}><Link href={l.href} className="text-paper">{t(l.key)}</Link></li>
          ))}
        </ul>
      )}
    </nav>
  );
}
