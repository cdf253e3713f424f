// The team area's browser-safe face: types, schemas and pure helpers that client components may import.
export * from "./chart";
export * from "./first-day-steps";
export * from "./schemas";
export * from "./error-keys";
export * from "./roster-text";
