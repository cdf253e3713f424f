"use client";
import { ErrorState } from "@/components/shell/route-states";

export default function AppError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <ErrorState error={error} reset={reset} area="Riser" home={{ href: "/learn", label: "Back to your learning" }} />;
}
