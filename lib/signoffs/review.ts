import "server-only";
/**
 * A reviewer's decision on a waiting sign-off: approve, or return it with a comment. The change and
 * its audit row commit together on the locked row; then the learner is mailed and, on approval,
 * the module's completion is checked again (a required sign-off may be the last thing missing).
 */
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { signOff, user } from "@/db/schema";
import { AccessError, canManageOrganization, type Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { audit } from "@/lib/audit";
import { checkAndRecordCompletion } from "@/lib/completion";
import { findModule } from "@/lib/content";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail";
import { greeting, mailTranslator } from "@/lib/mail";

export type ReviewResult = { id: string; status: "approved" | "returned"; reviewedAt: string; moduleCompleted: boolean };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export async function reviewSignOff(viewer: Viewer, id: string, input: { decision: "approve" | "return"; comment: string }, ip: string | null): Promise<ReviewResult> {
  if (!UUID.test(id)) throw new DomainError("not-found", "No such sign-off.");
  const status = input.decision === "approve" ? ("approved" as const) : ("returned" as const);
  const comment = input.comment.trim() || null;
  const reviewedAt = new Date();

  const row = await db.transaction(async (tx) => {
    const [so] = await tx.select().from(signOff).where(eq(signOff.id, id)).for("update");
    if (!so) throw new DomainError("not-found", "No such sign-off.");
    if (!canManageOrganization(viewer, so.organizationId)) throw new AccessError(403, "Only a manager of the learner's organization or an admin can review this sign-off.");
    if (so.userId === viewer.id) throw new AccessError(403, "You cannot sign off your own skill: another manager or an admin reviews it.");
    if (so.status !== "submitted") throw new DomainError("conflict", `This sign-off was already ${so.status}.`);
    await tx
      .update(signOff)
      .set({ status, reviewerId: viewer.id, reviewComment: comment, reviewedAt, activeKey: status === "returned" ? null : so.activeKey })
      .where(and(eq(signOff.id, id), eq(signOff.status, "submitted")));
    await audit(
      {
        actor: viewer,
        organizationId: so.organizationId,
        action: status === "approved" ? "signoff.approve" : "signoff.return",
        targetType: "sign-off",
        targetId: so.id,
        reason: comment,
        ip,
        details: { learnerId: so.userId, module: so.moduleSlug, skill: so.skillId },
      },
      tx,
    );
    return so;
  });

  const mod = findModule(row.moduleSlug);
  const skillTitle = mod?.skills.find((s) => s.id === row.skillId)?.title ?? row.skillId;
  const moduleTitle = mod?.meta.title ?? row.moduleSlug;
  const moduleCompleted = status === "approved" ? (await checkAndRecordCompletion(row.userId, row.moduleSlug)) !== null : false;

  const [learner] = await db.select({ email: user.email, name: user.name, language: user.language }).from(user).where(eq(user.id, row.userId));
  if (learner) {
    const link = `${env.APP_URL}/modules/${row.moduleSlug}/sign-offs`;
    const t = mailTranslator(learner.language);
    const names = { reviewer: viewer.name, module: moduleTitle, skill: skillTitle };
    await sendMail(
      status === "approved"
        ? {
            to: learner.email,
            subject: t("signoff.approvedSubject", { skill: skillTitle }),
            text: `${greeting(t, learner.name)}\n\n${t("signoff.approvedBody", names)}${comment ? `\n${t("signoff.comment", { comment })}` : ""}${moduleCompleted ? `\n\n${t("signoff.completes", { module: moduleTitle })}` : ""}\n\n${t("signoff.yourSignoffs", { link })}\n`,
            kind: "signoff-approved",
          }
        : {
            to: learner.email,
            subject: t("signoff.returnedSubject", { skill: skillTitle }),
            text: `${greeting(t, learner.name)}\n\n${t("signoff.returnedBody", { ...names, comment: comment ?? "", link })}\n`,
            kind: "signoff-returned",
          },
    );
  }
  return { id: row.id, status, reviewedAt: reviewedAt.toISOString(), moduleCompleted };
}
