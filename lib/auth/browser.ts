// The auth area's browser-safe face: the form schemas (the React client for better-auth is components/auth/auth-client.ts).
export * from "./schemas";
