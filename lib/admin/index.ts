import "server-only";
// The admin area's public face on the server; other areas, pages and routes import only this file or ./browser.
export * from "./audit-log";
export * from "./content";
export * from "./http";
export * from "./mail";
export * from "./organizations";
export * from "./overview";
export * from "./people";
export * from "./schemas";
