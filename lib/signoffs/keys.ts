/**
 * Object keys of sign-off evidence: "sign-offs/<userId>/<signOffId>/<evidenceId>.<ext>" and
 * "….thumb.jpg". Built from ids only — never from anything the learner typed or named.
 */
export const EVIDENCE_PREFIX = "sign-offs/";

export function evidenceKeys(userId: string, signOffId: string, evidenceId: string, ext: string, withThumb: boolean) {
  const base = `${EVIDENCE_PREFIX}${userId}/${signOffId}/${evidenceId}`;
  return { objectKey: `${base}.${ext}`, thumbnailKey: withThumb ? `${base}.thumb.jpg` : null };
}
