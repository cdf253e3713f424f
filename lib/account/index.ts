import "server-only";
// The account area's public face on the server; other areas, pages and routes import only this file or ./browser.
export * from "./records";
export * from "./sessions";
export * from "./language";
