import { getTranslations } from "next-intl/server";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { env, isLocalInstance } from "@/lib/env";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("admin");
  return { title: t("dev.title") };
}
export const dynamic = "force-dynamic";

type Message = { id: string; at: string; from: string; to: string[]; subject: string; text: string };

/**
 * The local mail catcher's inbox. Exists only on a local instance (RISER_LOCAL=1 on a loopback
 * APP_URL, set by the scripts) with MAIL_CATCHER_URL; lib/env refuses the catcher anywhere else.
 */
export default async function DevMailPage({ searchParams }: { searchParams: Promise<{ id?: string }> }) {
  if (!env.MAIL_CATCHER_URL || !isLocalInstance(env)) notFound();
  const { id } = await searchParams;
  const t = await getTranslations("admin");
  let messages: Message[] = [];
  let problem: string | null = null;
  try {
    const res = await fetch(`${env.MAIL_CATCHER_URL}/messages`, { cache: "no-store" });
    messages = (await res.json()) as Message[];
  } catch {
    problem = t("dev.down");
  }
  const open = messages.find((m) => m.id === id) ?? null;
  return (
    <div>
      <h1 className="text-3xl">{t("dev.title")}</h1>
      <p className="mt-2 rounded border-l-4 border-copper bg-copper-light p-3 text-sm">
        {t("dev.note")}
      </p>
      {problem ? <p role="alert" className="mt-4 text-caution">{problem}</p> : null}
      {!problem && messages.length === 0 ? <p className="mt-4">{t("dev.none")}</p> : null}
      <div className="mt-4 grid grid-cols-[minmax(0,1fr)] gap-4 md:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <ul className="flex min-w-0 flex-col gap-2 break-words" aria-label={t("dev.messages")}>
          {messages.map((m) => (
            <li key={m.id} className={`rounded border p-2 ${m.id === id ? "border-water bg-water-light" : "border-line bg-panel"}`}>
              <a href={`/dev/mail?id=${m.id}`} className="font-bold">{m.subject || t("dev.noSubject")}</a>
              <p className="text-sm text-muted">{t("dev.to", { to: m.to.join(", "), at: new Date(m.at).toLocaleString("en-US", { timeZone: "UTC" }) })}</p>
            </li>
          ))}
        </ul>
        {open ? (
          <article className="rounded border border-line bg-panel p-4" aria-label={t("dev.message")}>
            <h2 className="text-xl">{open.subject}</h2>
            <p className="text-sm text-muted">{t("dev.fromTo", { from: open.from, to: open.to.join(", ") })}</p>
            <pre className="mt-3 whitespace-pre-wrap break-words font-mono text-sm">{open.text}</pre>
          </article>
        ) : null}
      </div>
    </div>
  );
}
