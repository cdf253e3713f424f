export * from "./auth";
export * from "./org";
export * from "./catalog";
export * from "./quiz";
