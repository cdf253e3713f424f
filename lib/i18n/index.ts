// lib/i18n's server face: everything in ./browser plus the request's language, the catalogs, the
// translator for code without a request (mail, PDFs), the language cookie and the translation of API
// refusals. Nothing here reaches the database (storing a person's language is lib/account's).
import "server-only";
export * from "./browser";
export * from "./choice";
export * from "./locale";
export * from "./messages";
export * from "./translator";
export * from "./localize-error";
