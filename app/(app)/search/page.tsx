import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import { Suspense } from "react";
import { SearchBox } from "@/components/search/search-box";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("search"))("title") };
}

export default async function SearchPage() {
  await requireViewer("signed-in", "/search");
  const t = await getTranslations("search");
  return (
    <>
      <PageTitle title={t("title")} />
      <Suspense>
        <SearchBox />
      </Suspense>
    </>
  );
}
