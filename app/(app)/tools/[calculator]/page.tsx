import { getTranslations } from "next-intl/server";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { CalculatorPage, isCalculatorId } from "@/components/tools/calculator-page";
import { requireViewer } from "@/lib/access";

type Params = { params: Promise<{ calculator: string }> };

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const { calculator } = await params;
  const t = await getTranslations("tools");
  return { title: isCalculatorId(calculator) ? t(`info.${calculator}.title`) : t("calculator") };
}

export default async function ToolPage({ params }: Params) {
  const { calculator } = await params;
  await requireViewer("signed-in", `/tools/${calculator}`);
  if (!isCalculatorId(calculator)) notFound();
  return <CalculatorPage id={calculator} />;
}
