import "server-only";
// The language core's server face: the browser-safe parts, the catalogs and the request's language.
export * from "./config";
export * from "./negotiate";
export * from "./messages";
export * from "./locale";
// ./choice (database and cookies) is imported by its one route directly
export * from "./translator";
