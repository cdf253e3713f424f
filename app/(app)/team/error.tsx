"use client";
import { ErrorState } from "@/components/shell/route-states";

export default function TeamError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <ErrorState error={error} reset={reset} area="the team pages" home={{ href: "/team", label: "Back to the team board" }} />;
}
