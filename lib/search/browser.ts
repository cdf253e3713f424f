// The search area's browser-safe face: the search engine, limits and the document builder.
export * from "./engine";
export * from "./docs";
