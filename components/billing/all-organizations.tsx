import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { Table } from "@/components/ui/table";
import { organizationSeatList } from "@/lib/billing";
import { isoDay } from "@/lib/dates";

export async function AllOrganizations() {
  const list = await organizationSeatList();
  return (
    <>
      <PageTitle title="Seats and billing" lead="Every organization's seats. Open one to see its receipts or to buy seats for it." />
      <Table
        label="Organizations and their seats"
        rows={list}
        rowKey={(o) => o.orgId}
        columns={[
          { key: "org", header: "Organization", cell: (o) => <Link href={`/team/billing?org=${o.orgId}`}>{o.orgName}</Link> },
          { key: "seats", header: "Seats", headerClassName: "px-3 py-2 text-right", className: "text-right font-mono", cell: (o) => o.seats },
          { key: "used", header: "In use", headerClassName: "px-3 py-2 text-right", className: "text-right font-mono", cell: (o) => o.used },
          { key: "free", header: "Free", headerClassName: "px-3 py-2 text-right", className: "text-right font-mono", cell: (o) => o.free },
          { key: "trial", header: "Trial", cell: (o) => (o.trial === "none" ? "—" : `${o.trial === "active" ? "until" : "ended"} ${isoDay(o.trialEndsAt)}`) },
        ]}
      />
    </>
  );
}
