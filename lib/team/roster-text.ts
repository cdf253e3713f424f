// Roster row problems and notes as catalog keys (browser-safe): the page shows them in the reader's language.

/** A row problem or note as a key of the team catalog (`bulk.row.*`) with its parts, for the reader's language. */
export type RosterMessage = { key: string; values: Record<string, string> };

/**
 * A row's problems or notes for the page, with `t` the reader's team catalog: the catalog's words
 * when the keys came with the row, else the English text as it came.
 */
export function rosterRowText(messages: RosterMessage[] | undefined, englishText: string[], t: (key: string, values: Record<string, string>) => string): string[] {
  return messages?.length === englishText.length ? messages.map((m) => t(`bulk.row.${m.key}`, m.values)) : englishText;
}
