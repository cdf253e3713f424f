/**
 * The one helper for counted nouns in the UI and in mail: "1 member", "2 members", "1 CE hour".
 * Chooses the form with Intl.PluralRules (English rules: "one" for exactly 1, "other" otherwise,
 * including 0 and 1.5). Plain data, usable on the server and in the browser.
 */
const rules = new Intl.PluralRules("en-US");
const numbers = new Intl.NumberFormat("en-US", { maximumFractionDigits: 2 });

/** Irregular plurals of the nouns Riser counts; every other noun takes "s". */
const IRREGULAR: Record<string, string> = { person: "people", "sign-off": "sign-offs", match: "matches", address: "addresses", "CE hour": "CE hours" };

export function pluralNoun(n: number, singular: string, pluralForm?: string): string {
  if (rules.select(n) === "one") return singular;
  if (pluralForm) return pluralForm;
  if (IRREGULAR[singular]) return IRREGULAR[singular]!;
  // "open invitation" → "open invitations": the last word takes the plural
  return /(s|x|z|ch|sh)$/.test(singular) ? `${singular}es` : `${singular}s`;
}

/** "1 member", "3 members", "1,200 rows", "1.5 CE hours". */
export function plural(n: number, singular: string, pluralForm?: string): string {
  return `${numbers.format(n)} ${pluralNoun(n, singular, pluralForm)}`;
}
