"use client";

import { useTranslations } from "next-intl";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { CalculatorId } from "@/lib/hydraulics";

/** Endpoint the lead wires to lib/tools/summary-pdf.ts (`summaryPdfResponse`). */
export const SUMMARY_PDF_ENDPOINT = "/api/tools/summary";

/** asks the server to recompute these inputs and return a one-page PDF summary, then downloads it */
export function PdfButton({ id, input }: { id: CalculatorId; input: unknown }) {
  const t = useTranslations("tools");
  const [state, setState] = useState<"idle" | "busy" | "error">("idle");
  const [message, setMessage] = useState<string | null>(null);

  async function download() {
    setState("busy");
    setMessage(null);
    try {
      const res = await fetch(SUMMARY_PDF_ENDPOINT, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ id, input }),
      });
      if (!res.ok) {
        const body = (await res.json().catch(() => null)) as { error?: string } | null;
        throw new Error(body?.error ?? t("pdfFailedStatus", { status: res.status }));
      }
      const blob = await res.blob();
      const url = URL.createObjectURL(blob);
      const a = document.createElement("a");
      a.href = url;
      a.download = `riser-${id}-summary.pdf`;
      document.body.appendChild(a);
      a.click();
      a.remove();
      setTimeout(() => URL.revokeObjectURL(url), 10_000);
      setState("idle");
    } catch (e) {
      setState("error");
      setMessage(e instanceof Error ? e.message : t("pdfFailed"));
    }
  }

  return (
    <div className="flex flex-col gap-2">
      <Button type="button" variant="secondary" onClick={download} disabled={state === "busy" || input === null}>
        {state === "busy" ? t("pdfBusy") : t("pdfDownload")}
      </Button>
      {message ? (
        <p role="alert" className="text-sm font-bold text-caution">
          {message}
        </p>
      ) : null}
    </div>
  );
}
