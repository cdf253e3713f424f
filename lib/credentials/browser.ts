// The credentials area's browser-safe face: public addresses and pure helpers.
export * from "./urls";
export { CALENDAR_YEARS, describeSetting, PERIOD_LENGTHS, type PeriodSetting } from "./period";
export { periodSettingInput, type PeriodSettingInput } from "./period-input";
