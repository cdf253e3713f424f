"use client";
import { useState } from "react";
import { authClient } from "@/components/auth/auth-client";

/** "Send the link again" for an address that still needs confirming (better-auth's own endpoint, rate-limited there). */
export function ResendConfirmation({ email }: { email: string }) {
  const [state, setState] = useState<"idle" | "busy" | "sent" | "failed">("idle");
  return (
    <p className="flex flex-wrap items-center gap-3">
      <button
        type="button"
        disabled={state === "busy"}
        className="min-h-11 rounded border border-ink/40 bg-panel px-3 font-bold disabled:opacity-50"
        onClick={async () => {
          setState("busy");
          const { error } = await authClient.sendVerificationEmail({ email, callbackURL: "/sign-in?verified=1" });
          setState(error ? "failed" : "sent");
        }}
      >
        {state === "busy" ? "Sending…" : "Send the link again"}
      </button>
      <span role="status" className="text-sm">
        {state === "sent" ? `A new link is on its way to ${email}.` : state === "failed" ? "That did not work; wait a minute and try again." : ""}
      </span>
    </p>
  );
}
