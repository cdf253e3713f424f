// The quiz area's browser-safe face: the pure engine (seeded draw, grading rules) and answer input.
export * from "./engine";
