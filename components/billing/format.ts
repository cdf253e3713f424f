/** Dates as the billing pages print them (UTC, so server and browser agree). */
import { receiptDate, receiptDateTime } from "@/lib/dates";

export const formatDay = (iso: string) => receiptDate(iso);
export const formatDayTime = (iso: string) => `${receiptDateTime(iso)} UTC`;
export const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
