/** Kept for existing imports: the CSV writer (formula guard, quoting, streaming) lives in lib/csv. */
export { csvCell, csvLine, csvResponse, neutralise } from "@/lib/csv";
