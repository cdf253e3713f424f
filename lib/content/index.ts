import "server-only";
// The content area's public face on the server; other areas, pages and routes import only this file or ./browser.
export * from "./load";
export * from "./schema";
export * from "./editions";
export * from "./text";
export { twinProblems, twinPairs, type SpanishText, type TwinPair } from "./checks";
export { enHash, readStamp, writeStamp } from "./stamp";
