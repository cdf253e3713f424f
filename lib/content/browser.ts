// The content area's browser-safe face: types, schemas and pure helpers that client components may import.
export * from "./schema";
export * from "./editions";
