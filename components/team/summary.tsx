"use client";
import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { useFormatter, useTranslations } from "next-intl";
import useSWR from "swr";
import { FormError } from "@/components/ui/field";
import { getJson } from "@/lib/fetcher";
import type { TeamTotal, WeekPoint } from "@/lib/team";
import { startOfIsoDay } from "@/lib/dates";
import { chartColors } from "@/lib/theme/browser";
import { serverFirst } from "@/components/ui/server-first";
import { PERCENT_AXIS, PERCENT_CHART_MARGIN, WEEK_AXIS } from "@/lib/team/browser";
import { Table } from "@/components/ui/table";

type Summary = { teams: TeamTotal[]; weeks: WeekPoint[] };

const pct = (t: TeamTotal) => (t.cells ? Math.round((t.passed / t.cells) * 100) : 0);

/** Totals per team and the two charts, fetched once per visit (they cover the whole organization). */
export function TeamSummary({ org, showOrgNames, initial }: { org: string | null; showOrgNames: boolean; initial?: Summary }) {
  const tr = useTranslations("team");
  const format = useFormatter();
  const weekLabel = (d: string) => format.dateTime(startOfIsoDay(d), { month: "short", day: "numeric", timeZone: "UTC" });
  const key = `/api/team/summary${org ? `?org=${encodeURIComponent(org)}` : ""}`;
  const { data, error, isLoading, mutate } = useSWR<Summary>(key, getJson, { revalidateOnFocus: false, ...serverFirst(key, initial && { key, data: initial }) });
  // people without a team are grouped under a name in the reader's language
  const teamName = (t: TeamTotal) => (t.teamId === null ? tr("noTeam") : t.team);
  const label = (t: TeamTotal) => (showOrgNames ? `${t.orgName} · ${teamName(t)}` : teamName(t));
  return (
    <section aria-labelledby="summary-heading" className="mb-10">
      <h2 id="summary-heading" className="mb-3 text-2xl">
        {tr("summary.heading")}
      </h2>
      {error ? (
        <div className="flex flex-col items-start gap-2">
          <FormError message={tr("summary.loadFailed", { message: (error as Error).message })} />
          <button type="button" onClick={() => mutate()} className="min-h-11 rounded border border-ink/40 bg-panel px-4 font-bold">
            {tr("tryAgain")}
          </button>
        </div>
      ) : isLoading || !data ? (
        <p role="status">{tr("summary.loading")}</p>
      ) : data.teams.length === 0 ? (
        <p>{tr("summary.none")}</p>
      ) : (
        <>
          <Table
            className="mb-6"
            label={tr("summary.tableLabel")}
            caption={tr("summary.heading")}
            density="compact"
            rows={data.teams}
            rowKey={(t) => `${t.orgName}/${t.teamId}`}
            columns={[
              { key: "team", header: tr("invite.team"), rowHeader: true, cell: (t) => label(t) },
              { key: "people", header: tr("assign.people"), className: "font-mono", cell: (t) => t.people },
              { key: "passed", header: tr("summary.passed"), className: "font-mono", cell: (t) => tr("summary.passedValue", { passed: t.passed, cells: t.cells, pct: pct(t) }) },
              { key: "overdue", header: tr("status.overdue"), className: "font-mono", cell: (t) => <span className={t.overdue ? "font-bold text-caution" : ""}>{t.overdue}</span> },
              { key: "expiring", header: tr("summary.expiring"), className: "font-mono", cell: (t) => t.expiring },
              { key: "expired", header: tr("status.expired"), className: "font-mono", cell: (t) => t.expired },
              { key: "failed", header: tr("status.failed"), className: "font-mono", cell: (t) => t.failed },
            ]}
          />
          <div className="grid gap-6 lg:grid-cols-2">
            <figure className="rounded border border-line bg-panel p-3">
              <figcaption className="mb-2 font-bold">{tr("summary.weeksChart")}</figcaption>
              <div className="h-60" aria-hidden="true">
                <ResponsiveContainer width="100%" height="100%">
                  <BarChart data={data.weeks.map((w) => ({ ...w, label: weekLabel(w.week) }))} margin={{ top: 8, right: 8, bottom: 0, left: -16 }} accessibilityLayer={false}>
                    <CartesianGrid strokeDasharray="3 3" stroke={chartColors.grid} />
                    <XAxis dataKey="label" tick={{ fontSize: WEEK_AXIS.fontSize, fill: chartColors.axis, angle: WEEK_AXIS.angle, textAnchor: WEEK_AXIS.textAnchor }} interval={WEEK_AXIS.interval} height={WEEK_AXIS.height} />
                    <YAxis allowDecimals={false} tick={{ fontSize: 11, fill: chartColors.axis }} />
                    <Tooltip />
                    <Bar dataKey="completions" name={tr("summary.completions")} fill={chartColors.primary} isAnimationActive={false} />
                  </BarChart>
                </ResponsiveContainer>
              </div>
              <table className="sr-only">
                <caption>{tr("summary.weeksCaption")}</caption>
                <thead>
                  <tr>
                    <th scope="col">{tr("summary.weekStarting")}</th>
                    <th scope="col">{tr("summary.completions")}</th>
                  </tr>
                </thead>
                <tbody>
                  {data.weeks.map((w) => (
                    <tr key={w.week}>
                      <td>{w.week}</td>
                      <td>{w.completions}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </figure>
            <figure className="rounded border border-line bg-panel p-3">
              <figcaption className="mb-2 font-bold">{tr("summary.shareChart")}</figcaption>
              <div className="h-60" aria-hidden="true">
                <ResponsiveContainer width="100%" height="100%">
                  <BarChart data={data.teams.map((t) => ({ team: label(t), passed: pct(t) }))} layout="vertical" margin={PERCENT_CHART_MARGIN} accessibilityLayer={false}>
                    <CartesianGrid strokeDasharray="3 3" stroke={chartColors.grid} />
                    <XAxis type="number" domain={[0, 100]} ticks={[...PERCENT_AXIS.ticks]} unit="%" tick={{ fontSize: PERCENT_AXIS.fontSize, fill: chartColors.axis }} />
                    <YAxis type="category" dataKey="team" width={110} tick={{ fontSize: 11, fill: chartColors.axis }} />
                    <Tooltip />
                    <Bar dataKey="passed" name={tr("summary.passedPct")} fill={chartColors.secondary} isAnimationActive={false} />
                  </BarChart>
                </ResponsiveContainer>
              </div>
              <p className="mt-2 text-sm text-muted">{tr("summary.same")}</p>
            </figure>
          </div>
        </>
      )}
    </section>
  );
}
