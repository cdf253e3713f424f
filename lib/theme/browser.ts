// The theme area's browser-safe face: types, schemas and pure helpers that client components may import.
export * from "./tokens";
export * from "./app-icon";
