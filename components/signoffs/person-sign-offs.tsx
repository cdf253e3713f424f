import { getTranslations } from "next-intl/server";
import Link from "next/link";
import type { Viewer } from "@/lib/access";
import { signOffsOfPerson } from "@/lib/signoffs";
import { EvidenceThumbs } from "./evidence-thumbs";
import { SignOffBadge } from "./status-badge";
import { isoDay } from "@/lib/dates";

const day = (d: Date) => isoDay(d);

/**
 * A person's practical sign-offs, for the person page of the team area (server component; the
 * query checks that the viewer is the person, a manager of their organization or an admin).
 */
export async function PersonSignOffs({ viewer, personId }: { viewer: Viewer; personId: string }) {
  const items = await signOffsOfPerson(viewer, personId);
  const t = await getTranslations("signoffs");
  return (
    <section aria-labelledby="person-signoffs-h" className="flex flex-col gap-3">
      <h2 id="person-signoffs-h" className="text-2xl">
        {t("heading")}
      </h2>
      {items.length === 0 ? (
        <p className="text-muted">{t("noneSent")}</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {items.map((s) => (
            <li key={s.id} className="rounded border border-line bg-panel p-3">
              <div className="flex flex-wrap items-start justify-between gap-2">
                <p>
                  <span className="font-bold">{s.skillTitle}</span>
                  <span className="text-muted"> — {s.moduleTitle}</span>
                </p>
                <SignOffBadge status={s.status} />
              </div>
              <p className="mt-1 text-sm text-muted">
                {t("sent", { date: day(s.submittedAt) })}
                {s.reviewedAt ? ` · ${t("reviewedBy", { status: s.status === "approved" ? "approved" : "returned", name: s.reviewerName ?? "—", date: day(s.reviewedAt) })}` : ""}
                {s.status === "submitted" ? (
                  <>
                    {" · "}
                    <Link href="/team/sign-offs">{t("reviewIt")}</Link>
                  </>
                ) : null}
              </p>
              {s.reviewComment ? <p className="mt-1 text-sm">“{s.reviewComment}”</p> : null}
              <div className="mt-2">
                <EvidenceThumbs signOffId={s.id} items={s.evidence} />
              </div>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
