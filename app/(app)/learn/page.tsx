import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";

export const metadata: Metadata = { title: "My training" };

export default async function LearnPage() {
  const viewer = await requireViewer("signed-in", "/learn");
  return (
    <>
      <PageTitle title={`Hello, ${viewer.name}`} lead="Your assigned work, where you left off, and your certificates." />
      <p>
        <Link href="/modules">Browse the modules</Link>
      </p>
    </>
  );
}
