import "server-only";
// The refreshers area's face on the server: material changes from the catalog sync, who owes a refresher, the refresher quiz.
export * from "./changes";
export * from "./due";
export * from "./quiz";
