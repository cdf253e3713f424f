// lib/i18n's server face: everything in ./browser plus the request's language, the catalogs, the
// stored language choice and the translation of API refusals.
import "server-only";
export * from "./browser";
export * from "./choice";
export * from "./locale";
export * from "./messages";
export * from "./localize-error";
