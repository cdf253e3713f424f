import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import { AmendmentForm, JurisdictionForm, RowAction } from "@/components/editions/code-forms";
import { OrgPicker } from "@/components/team/org-picker";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { allOrganizations, pageScope, requireViewer } from "@/lib/access";
import { TOPIC_LABELS, listAmendments, listJurisdictions } from "@/lib/editions";
import { isoDay } from "@/lib/dates";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("editions");
  return { title: t("title") };
}

/** Jurisdictions with their adopted NFPA 13D edition (one is the default that lessons and quizzes follow) and local rules per topic. */
export default async function CodePage({ searchParams }: { searchParams: Promise<{ org?: string }> }) {
  const viewer = await requireViewer("manager", "/team/code");
  const t = await getTranslations("editions");
  const { org } = await searchParams;
  const scope = await pageScope(viewer, org);
  const adminOrg = viewer.role === "admin" ? scope.orgId : null;
  const q = adminOrg ? `?org=${encodeURIComponent(adminOrg)}` : "";
  const [places, rules] = scope.orgId ? await Promise.all([listJurisdictions(scope.orgId), listAmendments(scope.orgId)]) : [[], []];
  return (
    <>
      <PageTitle title={t("title")} lead={t("lead")} />
      <TeamNav current="/team/code" org={adminOrg} />
      {viewer.role === "admin" ? <OrgPicker orgs={await allOrganizations()} current={scope.orgId} allowAll={false} action="/team/code" /> : null}
      {scope.orgId ? (
        <div className="flex flex-col gap-8">
          <section aria-labelledby="places" className="flex flex-col gap-3">
            <h2 id="places" className="text-xl">{t("places")}</h2>
            {places.length === 0 ? <p>{t("noPlaces")}</p> : null}
            <ul className="flex flex-col gap-2">
              {places.map((p) => (
                <li key={p.id} className="flex flex-wrap items-center gap-3 rounded border border-line bg-panel px-3 py-2" data-testid="jurisdiction">
                  <span className="font-bold">{`${p.name}, ${p.state}`}</span>
                  <span className="text-sm">{`NFPA 13D ${p.edition}${p.ircP2904 ? " · IRC P2904" : ""}${p.isDefault ? ` · ${t("default")}` : ""}`}</span>
                  <span className="ml-auto flex flex-wrap gap-2">
                    {p.isDefault ? null : <RowAction url={`/api/team/jurisdictions/${p.id}`} method="POST" body={{ isDefault: true }} label={t("makeDefault")} ariaLabel={t("makeDefaultLabel", { name: p.name })} />}
                    <RowAction url={`/api/team/jurisdictions/${p.id}`} method="DELETE" label={t("remove")} ariaLabel={t("removeLabel", { name: p.name })} confirm={t("removeConfirm", { name: p.name, state: p.state })} />
                  </span>
                </li>
              ))}
            </ul>
            <JurisdictionForm org={adminOrg} />
          </section>
          <section aria-labelledby="local-rules" className="flex flex-col gap-3">
            <h2 id="local-rules" className="text-xl">{t("rules")}</h2>
            <ul className="flex flex-col gap-2">
              {rules.map((r) => (
                <li key={r.topic} className="flex flex-wrap items-start gap-3 rounded border border-line bg-panel px-3 py-2" data-testid="local-rule">
                  <span className="font-bold">{r.topic in TOPIC_LABELS ? t(`topic.${r.topic}`) : r.topic}</span>
                  <span className="max-w-prose whitespace-pre-line">{r.body}</span>
                  <span className="text-sm text-muted">{`${r.authorName}, ${isoDay(r.updatedAt)}`}</span>
                  <span className="ml-auto">
                    <RowAction url={`/api/team/amendments/${r.topic}${q}`} method="DELETE" label={t("remove")} ariaLabel={t("removeRuleLabel", { topic: r.topic })} confirm={t("removeRuleConfirm")} />
                  </span>
                </li>
              ))}
            </ul>
            <AmendmentForm org={adminOrg} />
          </section>
        </div>
      ) : (
        <p>{t("chooseOrg")}</p>
      )}
    </>
  );
}
