import "server-only";
/**
 * Practical sign-offs — the functions other areas call. The team board and the person page use
 * `signOffCountsFor` and `signOffsOfPerson`; completion uses `missingSignOffs` (registered in
 * lib/completion.ts); the jobs runner uses `removeOrphanedEvidence`.
 */
export { missingSignOffs } from "@/lib/completion";
export { evidenceUrl, reviewQueue, signOffCountsFor, signOffsOf, signOffsOfPerson, waitingCount, type PersonSignOff, type QueueItem, type SignOffCounts, type SignOffItem } from "./queries";
export { reviewSignOff } from "./review";
export { readUpload, submitSignOff } from "./submit";
export { removeOrphanedEvidence } from "./cleanup";
export { evidenceFileForViewer, canSeeSignOff } from "./access";
export * from "./access";
export * from "./cleanup";
export * from "./queries";
export * from "./review";
export * from "./schemas";
export * from "./seed";
export * from "./submit";
