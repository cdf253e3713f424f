// The language core's browser-safe face: the languages, their names and formatting tags.
export * from "./config";
export * from "./negotiate";
