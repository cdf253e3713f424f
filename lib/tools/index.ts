import "server-only";
// The tools area's public face on the server; other areas, pages and routes import only this file.
export * from "./summary-pdf";
