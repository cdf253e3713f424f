import "server-only";
// The team area's public face on the server; other areas, pages and routes import only this file or ./browser.
export * from "./assignments";
export * from "./board";
export * from "./board-extras";
export * from "./bulk";
export * from "./export";
export * from "./first-day";
export * from "./first-day-steps";
export * from "./invite-admin";
export * from "./invites";
export * from "./members";
export * from "./people";
export * from "./reminders";
export * from "./roster";
export * from "./schemas";
export * from "./teams";
export * from "./summary";
export * from "./security";
