// lib/i18n's face for code that may run in the browser: the languages, their names and formatting
// tags, Accept-Language negotiation, and the lookup of known messages in the errors catalog.
export * from "./config";
export * from "./negotiate";
export * from "./error-text";
export * from "./client-namespaces";
export * from "./formats";
