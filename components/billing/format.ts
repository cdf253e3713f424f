/** Dates as the billing pages print them (UTC, so server and browser agree). */
const day = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const dayTime = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", timeZone: "UTC", hour12: false });

export const formatDay = (iso: string) => day.format(new Date(iso));
export const formatDayTime = (iso: string) => `${dayTime.format(new Date(iso))} UTC`;
export const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
