export * from "./auth";
export * from "./org";
export * from "./catalog";
export * from "./quiz";
export * from "./certificates";
export * from "./team";
export * from "./billing";
export * from "./signoffs";
