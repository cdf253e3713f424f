"use client";
import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import useSWR from "swr";
import { FormError } from "@/components/ui/field";
import { getJson } from "@/lib/fetcher";
import type { TeamTotal, WeekPoint } from "@/lib/team";
import { monthDay, startOfIsoDay } from "@/lib/dates";
import { chartColors } from "@/lib/theme/browser";
import { serverFirst } from "@/components/ui/server-first";
import { PERCENT_AXIS, PERCENT_CHART_MARGIN, WEEK_AXIS } from "@/lib/team/browser";
import { Table } from "@/components/ui/table";

type Summary = { teams: TeamTotal[]; weeks: WeekPoint[] };

const pct = (t: TeamTotal) => (t.cells ? Math.round((t.passed / t.cells) * 100) : 0);
const weekLabel = (d: string) => monthDay(startOfIsoDay(d));

/** Totals per team and the two charts, fetched once per visit (they cover the whole organization). */
export function TeamSummary({ org, showOrgNames, initial }: { org: string | null; showOrgNames: boolean; initial?: Summary }) {
  const key = `/api/team/summary${org ? `?org=${encodeURIComponent(org)}` : ""}`;
  const { data, error, isLoading, mutate } = useSWR<Summary>(key, getJson, { revalidateOnFocus: false, ...serverFirst(key, initial && { key, data: initial }) });
  const label = (t: TeamTotal) => (showOrgNames ? `${t.orgName} · ${t.team}` : t.team);
  return (
    <section aria-labelledby="summary-heading" className="mb-10">
      <h2 id="summary-heading" className="mb-3 text-2xl">
        Totals per team
      </h2>
      {error ? (
        <div className="flex flex-col items-start gap-2">
          <FormError message={`The totals could not be loaded: ${(error as Error).message}`} />
          <button type="button" onClick={() => mutate()} className="min-h-11 rounded border border-ink/40 bg-panel px-4 font-bold">
            Try again
          </button>
        </div>
      ) : isLoading || !data ? (
        <p role="status">Loading the totals…</p>
      ) : data.teams.length === 0 ? (
        <p>No people yet, so there is nothing to total.</p>
      ) : (
        <>
          <Table
            className="mb-6"
            label="Totals per team table"
            caption="Totals per team"
            density="compact"
            rows={data.teams}
            rowKey={(t) => `${t.orgName}/${t.teamId}`}
            columns={[
              { key: "team", header: "Team", rowHeader: true, cell: (t) => label(t) },
              { key: "people", header: "People", className: "font-mono", cell: (t) => t.people },
              { key: "passed", header: "Modules passed", className: "font-mono", cell: (t) => `${t.passed} of ${t.cells} (${pct(t)}%)` },
              { key: "overdue", header: "Overdue", className: "font-mono", cell: (t) => <span className={t.overdue ? "font-bold text-caution" : ""}>{t.overdue}</span> },
              { key: "expiring", header: "Certificates expiring", className: "font-mono", cell: (t) => t.expiring },
              { key: "expired", header: "Expired", className: "font-mono", cell: (t) => t.expired },
              { key: "failed", header: "Failed last attempt", className: "font-mono", cell: (t) => t.failed },
            ]}
          />
          <div className="grid gap-6 lg:grid-cols-2">
            <figure className="rounded border border-line bg-panel p-3">
              <figcaption className="mb-2 font-bold">Modules completed per week (last 12 weeks)</figcaption>
              <div className="h-60" aria-hidden="true">
                <ResponsiveContainer width="100%" height="100%">
                  <BarChart data={data.weeks.map((w) => ({ ...w, label: weekLabel(w.week) }))} margin={{ top: 8, right: 8, bottom: 0, left: -16 }} accessibilityLayer={false}>
                    <CartesianGrid strokeDasharray="3 3" stroke={chartColors.grid} />
                    <XAxis dataKey="label" tick={{ fontSize: WEEK_AXIS.fontSize, fill: chartColors.axis, angle: WEEK_AXIS.angle, textAnchor: WEEK_AXIS.textAnchor }} interval={WEEK_AXIS.interval} height={WEEK_AXIS.height} />
                    <YAxis allowDecimals={false} tick={{ fontSize: 11, fill: chartColors.axis }} />
                    <Tooltip />
                    <Bar dataKey="completions" name="Completions" fill={chartColors.primary} isAnimationActive={false} />
                  </BarChart>
                </ResponsiveContainer>
              </div>
              <table className="sr-only">
                <caption>Modules completed per week</caption>
                <thead>
                  <tr>
                    <th scope="col">Week starting</th>
                    <th scope="col">Completions</th>
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
              <figcaption className="mb-2 font-bold">Share of modules passed, by team</figcaption>
              <div className="h-60" aria-hidden="true">
                <ResponsiveContainer width="100%" height="100%">
                  <BarChart data={data.teams.map((t) => ({ team: label(t), passed: pct(t) }))} layout="vertical" margin={PERCENT_CHART_MARGIN} accessibilityLayer={false}>
                    <CartesianGrid strokeDasharray="3 3" stroke={chartColors.grid} />
                    <XAxis type="number" domain={[0, 100]} ticks={[...PERCENT_AXIS.ticks]} unit="%" tick={{ fontSize: PERCENT_AXIS.fontSize, fill: chartColors.axis }} />
                    <YAxis type="category" dataKey="team" width={110} tick={{ fontSize: 11, fill: chartColors.axis }} />
                    <Tooltip />
                    <Bar dataKey="passed" name="Passed (%)" fill={chartColors.secondary} isAnimationActive={false} />
                  </BarChart>
                </ResponsiveContainer>
              </div>
              <p className="mt-2 text-sm text-muted">The same figures are in the totals table above.</p>
            </figure>
          </div>
        </>
      )}
    </section>
  );
}
