import { getTranslations } from "next-intl/server";
import type { Metadata } from "next";
import { ToolsIndex } from "@/components/tools/tools-index";
import { requireViewer } from "@/lib/access";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("tools");
  return { title: t("metaTitle") };
}

export default async function ToolsPage() {
  await requireViewer("signed-in", "/tools");
  return <ToolsIndex />;
}
