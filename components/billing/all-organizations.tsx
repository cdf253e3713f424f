import { getTranslations } from "next-intl/server";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { Table } from "@/components/ui/table";
import { organizationSeatList } from "@/lib/billing";
import { isoDay } from "@/lib/dates";

export async function AllOrganizations() {
  const list = await organizationSeatList();
  const t = await getTranslations("billing");
  return (
    <>
      <PageTitle title={t("title")} lead={t("all.lead")} />
      <Table
        label={t("all.label")}
        rows={list}
        rowKey={(o) => o.orgId}
        columns={[
          { key: "org", header: t("all.org"), cell: (o) => <Link href={`/team/billing?org=${o.orgId}`}>{o.orgName}</Link> },
          { key: "seats", header: t("figures.seats"), headerClassName: "px-3 py-2 text-right", className: "text-right font-mono", cell: (o) => o.seats },
          { key: "used", header: t("figures.used"), headerClassName: "px-3 py-2 text-right", className: "text-right font-mono", cell: (o) => o.used },
          { key: "free", header: t("figures.free"), headerClassName: "px-3 py-2 text-right", className: "text-right font-mono", cell: (o) => o.free },
          { key: "trial", header: t("all.trial"), cell: (o) => (o.trial === "none" ? "—" : t("all.trialState", { state: o.trial === "active" ? "active" : "ended", date: isoDay(o.trialEndsAt) })) },
        ]}
      />
    </>
  );
}
