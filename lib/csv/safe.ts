/** Kept for existing imports: the CSV writer lives in lib/csv (index.ts). */
export { toSafeCsv, type CsvValue } from "./index";
