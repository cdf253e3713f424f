"use client";
import { ErrorState } from "@/components/shell/route-states";

export default function AdminError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <ErrorState error={error} reset={reset} area="the admin console" home={{ href: "/admin", label: "Back to the admin overview" }} />;
}
