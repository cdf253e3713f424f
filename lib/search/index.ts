import "server-only";
// The search area's public face on the server; client code and the content build use ./browser.
export * from "./engine";
export * from "./docs";
export * from "./server";
