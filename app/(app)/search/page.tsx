import type { Metadata } from "next";
import { Suspense } from "react";
import { SearchBox } from "@/components/search/search-box";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";

export const metadata: Metadata = { title: "Search" };

export default async function SearchPage() {
  await requireViewer("signed-in", "/search");
  return (
    <>
      <PageTitle title="Search" />
      <Suspense>
        <SearchBox />
      </Suspense>
    </>
  );
}
