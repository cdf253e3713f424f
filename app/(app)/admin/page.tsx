import type { Metadata } from "next";
import Link from "next/link";
import { When } from "@/components/ui/data-table";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { adminOverview } from "@/lib/admin";
import { Figure } from "@/components/admin/figure";

export const metadata: Metadata = { title: "Admin" };

export default async function AdminPage() {
  await requireViewer("admin", "/admin");
  const o = await adminOverview();
  return (
    <>
      <PageTitle title="Admin" lead="Run this Riser instance: organizations and people, the content catalog, outgoing mail and the audit log." />
      <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Figure label="Organizations" value={o.organizations} href="/admin/organizations" />
        <Figure label="People" value={o.people} href="/admin/people" />
        <Figure label="Banned people" value={o.banned} href="/admin/people" warn={o.banned > 0} />
        <Figure label="Failed mail, last 7 days" value={o.mailFailedWeek} href="/admin/mail" warn={o.mailFailedWeek > 0} />
      </ul>
      <section aria-labelledby="sync-h" className="mt-8">
        <h2 id="sync-h" className="text-2xl">Content</h2>
        <p className="mt-2">
          {o.lastSync ? (
            <>
              Last synced <When iso={o.lastSync.at.toISOString()} /> {o.lastSync.ok ? "without problems" : <strong className="text-caution">with problems</strong>}.{" "}
            </>
          ) : (
            "Never synced on this instance. "
          )}
          <Link href="/admin/content">See the content status</Link>
        </p>
      </section>
      <section aria-labelledby="recent-h" className="mt-8">
        <h2 id="recent-h" className="text-2xl">Latest audit entries</h2>
        {o.recent.length ? (
          <ol className="mt-2 flex flex-col gap-2">
            {o.recent.map((r) => (
              <li key={r.id} className="rounded border border-line bg-panel px-3 py-2">
                <p className="flex flex-wrap items-baseline gap-x-3">
                  <span className="font-mono font-bold">{r.action}</span>
                  <When iso={r.at} />
                </p>
                <p className="text-sm break-words">
                  {r.actorEmail ?? "Riser itself"} → {r.targetLabel ?? `${r.targetType} ${r.targetId}`}
                  {r.reason ? <span className="text-muted"> · “{r.reason}”</span> : null}
                </p>
              </li>
            ))}
          </ol>
        ) : (
          <p className="mt-2">Nothing recorded yet.</p>
        )}
        <p className="mt-2">
          <Link href="/admin/audit">Open the audit log</Link>
        </p>
      </section>
    </>
  );
}
