/**
 * Field messages of the shared zod schemas (written in English, the API's language) → their key in
 * the "fieldErrors" catalog, so a form shows them in the reader's language whether they came from the
 * browser's check or the server's 400. Browser-safe.
 */
export const FIELD_ERROR_KEYS: Record<string, string> = {
  "Enter an e-mail address like name@company.com": "email",
  "At most 255 characters": "max255",
  "At most 200 characters": "max200",
  "At most 120 characters": "max120",
  "Choose learner, sales or manager": "chooseRole",
  "Choose English or Español": "chooseLanguage",
  "At most 10 items per invitation": "max10Items",
  "Choose a module or a learning path": "chooseItem",
  "Pick a due date": "pickDueDate",
  "Pick a real date": "pickRealDate",
  "Pick today or a later date": "pickLaterDate",
  "Choose at least one module or path": "chooseAtLeastOneItem",
  "Name the team": "nameTeam",
  "Give a new name, or archive or restore the team": "renameOrArchive",
  "Choose a team or a role": "chooseTeamOrRole",
  "The two passwords differ": "passwordsDiffer",
  "At most 500 people at once": "max500People",
  "Choose at least one person or team": "chooseTargets",
  "Choose one of your organization's teams": "chooseOwnTeam",
  "Choose a CSV file": "chooseCsv",
  "Use at least 15 characters (a few words make a good one)": "passwordLength",
  "Use at least 8 characters": "passwordLength8",
  "At most 128 characters": "max128",
  "Some fields need attention.": "someFields",
  "Set up two-step sign-in for your own account first": "ownTwoFactorFirst",
  "Say what is missing or needs redoing (at least 5 characters): the learner reads this.": "returnComment",
  "Choose approve or return.": "approveOrReturn",
};
