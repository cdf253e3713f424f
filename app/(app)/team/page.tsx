import type { Metadata } from "next";
import { getLocale, getTranslations } from "next-intl/server";
import { localeOf } from "@/lib/i18n/browser";
import { TeamBoard, type BoardFilters } from "@/components/team/board";
import { OrgPicker } from "@/components/team/org-picker";
import { TeamSummary } from "@/components/team/summary";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { asJson } from "@/components/ui/server-first";
import { requireViewer } from "@/lib/access";
import { boardModules, boardPage, completionsPerWeek, teamTotals } from "@/lib/team";
import { withCellExtras } from "@/lib/team";
import { boardQuerySchema, parseBoardQuery } from "@/lib/team";
import { allOrganizations, pageScope, teamsInScope } from "@/lib/access";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("team");
  return { title: t("board.title") };
}

export default async function TeamPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer("manager", "/team");
  const t = await getTranslations("team");
  const raw = await searchParams;
  const params = new URLSearchParams(Object.entries(raw).flatMap(([k, v]) => (typeof v === "string" ? [[k, v]] : [])));
  const parsed = parseBoardQuery(params);
  // Filters that do not parse are dropped (the board starts unfiltered); the organization stays.
  const q = parsed.success ? parsed.data : boardQuerySchema.parse({ org: params.get("org")?.slice(0, 36) || undefined });
  const scope = await pageScope(viewer, q.org);
  // The board's first page and the summary come with the page, so the client does not fetch them again on mount.
  const [teams, orgs, firstPage, teamsTotals, weeks] = await Promise.all([
    teamsInScope(scope),
    viewer.role === "admin" ? allOrganizations() : Promise.resolve([]),
    boardPage(scope, q, new Date(), localeOf(await getLocale())).then(async (page) => ({ ...page, rows: await withCellExtras(page.rows) })),
    teamTotals(scope),
    completionsPerWeek(scope),
  ]);
  const initial: BoardFilters = {
    team: q.team ?? "",
    status: q.status ?? "",
    module: q.module ?? "",
    dueBefore: q.dueBefore ?? "",
    q: q.q ?? "",
    sort: q.sort,
    dir: q.dir ?? "",
    page: q.page,
    pageSize: q.pageSize,
  };
  return (
    <>
      <PageTitle
        title={t("board.title")}
        lead={t("board.lead", { org: scope.orgName ?? t("orgPicker.all") })}
      />
      <TeamNav current="/team" org={scope.orgId && viewer.role === "admin" ? scope.orgId : null} />
      {viewer.role === "admin" ? <OrgPicker orgs={orgs} current={scope.orgId} action="/team" /> : null}
      <TeamBoard
        key={scope.orgId ?? "all"}
        modules={boardModules().map(({ slug, title }) => ({ slug, title }))}
        teams={teams}
        org={viewer.role === "admin" ? scope.orgId : null}
        showOrgNames={!scope.orgId}
        initial={initial}
        initialPage={asJson(firstPage)}
      />
      <TeamSummary org={viewer.role === "admin" ? scope.orgId : null} showOrgNames={!scope.orgId} initial={asJson({ teams: teamsTotals, weeks })} />
    </>
  );
}
