/** Limits and input schemas shared by the sign-off forms (browser) and route handlers (server). */
import { z } from "zod";
import { slug } from "@/lib/content/browser";

/**
 * All files of one submission together. Kept below the 10 MiB that Next's proxy buffers of a
 * request body (proxyClientMaxBodySize), so that a full-size upload always reaches the handler whole.
 */
export const MAX_UPLOAD_BYTES = 8 * 1024 * 1024;
export const MAX_UPLOAD_LABEL = "8 MB";
export const MAX_FILES = 3;
export const MAX_NOTE = 1000;
/** what the file picker offers; the server checks every file by its content, never by this */
export const ACCEPT = "image/jpeg,image/png,image/heic,image/heif,application/pdf,.jpg,.jpeg,.png,.heic,.heif,.pdf";

export const noteInput = z
  .string()
  .trim()
  .max(MAX_NOTE, `Keep the note under ${MAX_NOTE} characters.`)
  .optional()
  .transform((v) => (v ? v : null));

export const submitFields = z.object({
  module: slug,
  skill: slug,
  note: noteInput,
});
export type SubmitFields = z.infer<typeof submitFields>;

/** The learner's form as react-hook-form sees it (files are checked separately, then by the server). */
export const uploadFormInput = z.object({
  note: z.string().max(MAX_NOTE, `Keep the note under ${MAX_NOTE} characters.`),
});
export type UploadFormInput = z.infer<typeof uploadFormInput>;

export const reviewInput = z
  .object({
    decision: z.enum(["approve", "return"], { error: "Choose approve or return." }),
    comment: z.string().trim().max(MAX_NOTE, `Keep the comment under ${MAX_NOTE} characters.`).optional().default(""),
  })
  .superRefine((v, ctx) => {
    if (v.decision === "return" && v.comment.length < 5) {
      ctx.addIssue({ code: "custom", path: ["comment"], message: "Say what is missing or needs redoing (at least 5 characters): the learner reads this." });
    }
  });
export type ReviewInput = z.input<typeof reviewInput>;

/** Client-side check of the chosen files before sending (the server repeats every check by content). */
export function checkChosenFiles(files: { name: string; size: number }[]): string | null {
  if (!files.length) return "Choose at least one photo or PDF.";
  if (files.length > MAX_FILES) return `Choose up to ${MAX_FILES} files.`;
  const empty = files.find((f) => f.size === 0);
  if (empty) return `"${empty.name}" is empty (0 bytes). Choose the file again.`;
  const total = files.reduce((n, f) => n + f.size, 0);
  if (total > MAX_UPLOAD_BYTES) return `These files come to ${formatBytes(total)}; the limit is ${MAX_UPLOAD_LABEL} in all.`;
  return null;
}

export function formatBytes(n: number): string {
  if (n < 1024) return `${n} bytes`;
  if (n < 1024 * 1024) return `${Math.round(n / 1024)} KB`;
  return `${(n / (1024 * 1024)).toFixed(1)} MB`;
}
