import "server-only";
// The catalog area's public face on the server; other areas, pages and routes import only this file.
export * from "./sync";
export * from "./sync-hooks";
