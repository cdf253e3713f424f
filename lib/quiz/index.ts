import "server-only";
// The quiz area's public face on the server; other areas, pages and routes import only this file.
export * from "./attempts";
export * from "./input";
export * from "./sync";
