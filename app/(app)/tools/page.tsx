import type { Metadata } from "next";
import { ToolsIndex } from "@/components/tools/tools-index";
import { requireViewer } from "@/lib/access";

export const metadata: Metadata = { title: "Field calculators" };

export default async function ToolsPage() {
  await requireViewer("signed-in", "/tools");
  return <ToolsIndex />;
}
