import "server-only";
/**
 * Portable credentials: every certificate as an Open Badges 3.0 OpenBadgeCredential signed as a
 * VC-JWT (./badge, ./issue), the revocation status lists (./status), the signing keys and their
 * published forms (./keys), and each person's training history with CE hours per reporting period.
 */
export { issuerProfile, buildOpenBadgeCredential, buildAchievement, criteriaNarrative, dateTimeZ, type OpenBadgeCredential } from "./badge";
export { achievementFacts, credentialForCode, signedCredential } from "./issue";
export { buildKeyRing, didDocument, jwks, signCredential, type KeyRing, type PublishedKey } from "./keyring";
export { keyRing } from "./keys";
export { parseListNumber, revokedIndexes, signedStatusList } from "./status";
export { buildStatusListCredential, encodeStatusList } from "./status-list";
export * from "./urls";
export { historyPersonFor, historyFileName, periodSettingOf, trainingHistory, type TrainingHistory } from "./history";
export { historyCsv } from "./history-csv";
export { renderHistoryPdf } from "./history-pdf";
export { CALENDAR_YEARS, describeSetting, PERIOD_LENGTHS, type PeriodSetting } from "./period";
export { periodSettingInput, setPeriodSetting } from "./period-setting";
export { historyDownload } from "./history-download";
export { teamHistoryZip, TEAM_ZIP_MAX_PEOPLE } from "./history-zip";
