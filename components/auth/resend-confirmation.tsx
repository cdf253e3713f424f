"use client";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { authClient } from "@/components/auth/auth-client";

/** "Send the link again" for an address that still needs confirming (better-auth's own endpoint, rate-limited there). */
export function ResendConfirmation({ email }: { email: string }) {
  const t = useTranslations("auth");
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
        {state === "busy" ? t("sending") : t("sendAgain")}
      </button>
      <span role="status" className="text-sm">
        {state === "sent" ? t("newLinkSent", { email }) : state === "failed" ? t("resendFailed") : ""}
      </span>
    </p>
  );
}
