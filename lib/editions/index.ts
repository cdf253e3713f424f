import "server-only";
// The editions area's face on the server: adopted code per organization and local amendments.
export * from "./jurisdictions";
export * from "./amendments";
export * from "./browser";
