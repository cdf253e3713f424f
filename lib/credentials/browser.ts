// The credentials area's browser-safe face: public addresses and pure helpers.
export * from "./urls";
