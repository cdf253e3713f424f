// The theme area's public face (pure: the palette tokens); client code imports ./browser.
export * from "./tokens";
export * from "./app-icon";
