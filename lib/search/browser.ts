// The search area's browser-safe face: the search engine, limits, the document builder and the language scope.
export * from "./engine";
export * from "./docs";
export * from "./scope";
