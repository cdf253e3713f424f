import "server-only";
// The theme area's public face on the server; other areas, pages and routes import only this file or ./browser.
export * from "./tokens";
