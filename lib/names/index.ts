/**
 * The rule for a person's name (it is printed on certificates, so the server enforces it on every
 * path that sets one: sign-up, invitation acceptance, account settings — lib/auth hooks). Shared
 * with the browser forms. Printable characters of any script (letters with their accents, digits,
 * punctuation — rendering escapes them everywhere), at least one letter; no control or invisible
 * characters, no e-mail addresses or links; 2–100 characters after trimming.
 */
export const NAME_MIN = 2;
export const NAME_MAX = 100;

/** Trims and collapses runs of spaces (the stored form). */
export const normalizeName = (raw: string) => raw.normalize("NFC").trim().replace(/\s+/gu, " ");

const ALLOWED = /^[\p{L}\p{M}\p{N}\p{P}\p{S} ]+$/u;
const LINK = /(:\/\/|www\.|[\p{L}\p{N}-]\.(?:com|net|org|io|co|info|biz|xyz|app|dev|ru|cn|de|uk|us|example)\b|[\p{L}\p{N}-]\.[a-z]{2,}\/)/iu;

/** What is wrong with the name, or null when it is acceptable. */
export function nameProblem(raw: unknown): string | null {
  if (typeof raw !== "string") return "Enter your name.";
  // any control, format (zero-width, bidi) or line-break character, before normalizing hides it
  if (/[\p{Cc}\p{Cf}\p{Zl}\p{Zp}\p{Co}\p{Cn}]/u.test(raw)) return "Remove the control or invisible characters from the name.";
  const name = normalizeName(raw);
  if (name.length < NAME_MIN) return `Enter at least ${NAME_MIN} characters.`;
  if (name.length > NAME_MAX) return `At most ${NAME_MAX} characters.`;
  if (name.includes("@") || LINK.test(name)) return "Enter your name, not an e-mail address or a link.";
  if (!ALLOWED.test(name)) return "Use letters, digits, spaces and punctuation only.";
  if (!/\p{L}/u.test(name)) return "A name needs letters.";
  return null;
}
