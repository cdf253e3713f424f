import type { Metadata } from "next";
import { AmendmentForm, JurisdictionForm, RowAction } from "@/components/editions/code-forms";
import { OrgPicker } from "@/components/team/org-picker";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { allOrganizations, pageScope, requireViewer } from "@/lib/access";
import { TOPIC_LABELS, listAmendments, listJurisdictions } from "@/lib/editions";
import { isoDay } from "@/lib/dates";

export const metadata: Metadata = { title: "Adopted code" };

/** Jurisdictions with their adopted NFPA 13D edition (one is the default that lessons and quizzes follow) and local rules per topic. */
export default async function CodePage({ searchParams }: { searchParams: Promise<{ org?: string }> }) {
  const viewer = await requireViewer("manager", "/team/code");
  const { org } = await searchParams;
  const scope = await pageScope(viewer, org);
  const adminOrg = viewer.role === "admin" ? scope.orgId : null;
  const q = adminOrg ? `?org=${encodeURIComponent(adminOrg)}` : "";
  const [places, rules] = scope.orgId ? await Promise.all([listJurisdictions(scope.orgId), listAmendments(scope.orgId)]) : [[], []];
  return (
    <>
      <PageTitle title="Adopted code" lead="Where you work, the NFPA 13D edition each place adopted, and your local rules. Lessons and quizzes follow the default." />
      <TeamNav current="/team/code" org={adminOrg} />
      {viewer.role === "admin" ? <OrgPicker orgs={await allOrganizations()} current={scope.orgId} allowAll={false} action="/team/code" /> : null}
      {scope.orgId ? (
        <div className="flex flex-col gap-8">
          <section aria-labelledby="places" className="flex flex-col gap-3">
            <h2 id="places" className="text-xl">Jurisdictions</h2>
            {places.length === 0 ? <p>None yet: lessons show every edition&apos;s passages and quizzes ask only questions that hold in every edition.</p> : null}
            <ul className="flex flex-col gap-2">
              {places.map((p) => (
                <li key={p.id} className="flex flex-wrap items-center gap-3 rounded border border-line bg-panel px-3 py-2" data-testid="jurisdiction">
                  <span className="font-bold">{`${p.name}, ${p.state}`}</span>
                  <span className="text-sm">{`NFPA 13D ${p.edition}${p.ircP2904 ? " · IRC P2904" : ""}${p.isDefault ? " · default" : ""}`}</span>
                  <span className="ml-auto flex flex-wrap gap-2">
                    {p.isDefault ? null : <RowAction url={`/api/team/jurisdictions/${p.id}`} method="POST" body={{ isDefault: true }} label="Make default" ariaLabel={`Make ${p.name} the default`} />}
                    <RowAction url={`/api/team/jurisdictions/${p.id}`} method="DELETE" label="Remove" ariaLabel={`Remove ${p.name}`} confirm={`Remove ${p.name}, ${p.state}?`} />
                  </span>
                </li>
              ))}
            </ul>
            <JurisdictionForm org={adminOrg} />
          </section>
          <section aria-labelledby="local-rules" className="flex flex-col gap-3">
            <h2 id="local-rules" className="text-xl">Local rules</h2>
            <ul className="flex flex-col gap-2">
              {rules.map((r) => (
                <li key={r.topic} className="flex flex-wrap items-start gap-3 rounded border border-line bg-panel px-3 py-2" data-testid="local-rule">
                  <span className="font-bold">{TOPIC_LABELS[r.topic as keyof typeof TOPIC_LABELS] ?? r.topic}</span>
                  <span className="max-w-prose whitespace-pre-line">{r.body}</span>
                  <span className="text-sm text-muted">{`${r.authorName}, ${isoDay(r.updatedAt)}`}</span>
                  <span className="ml-auto">
                    <RowAction url={`/api/team/amendments/${r.topic}${q}`} method="DELETE" label="Remove" ariaLabel={`Remove the local rule on ${r.topic}`} confirm="Remove this local rule?" />
                  </span>
                </li>
              ))}
            </ul>
            <AmendmentForm org={adminOrg} />
          </section>
        </div>
      ) : (
        <p>Choose the organization first.</p>
      )}
    </>
  );
}
