import "server-only";
/**
 * The certificates area's public face. Issuing is called by lib/completion.ts; the team board reads
 * `certificatesOfOrganization` (status and expiringSoon computed at read time). Viewer-dependent
 * actions (download, revoke) live in ./access, the PDF in ./pdf, the reminder job in ./reminders.
 */
export { issueCertificateForCompletion, type IssuedCertificate } from "./issue";
export {
  certificatesOfHolder,
  certificatesOfOrganization,
  verificationByCode,
  type HolderCertificate,
  type OrganizationCertificate,
  type PublicVerification,
} from "./queries";
export { sendExpiryReminders, type ReminderRun } from "./reminders";
export { certificateStatus, isExpiringSoon, EXPIRY_REMINDER_DAYS, type CertificateStatus, type CertificateKind } from "./status";
export * from "./access";
export * from "./issue";
export * from "./jobs";
export * from "./queries";
export * from "./reminders";
export * from "./schemas";
export * from "./seed";
export * from "./status";
export * from "./verify";
export * from "./verify-code";
export * from "./credential-entry";
export { subjectTitleIn } from "./subject-title";
