// wawoff2 (Google's WOFF2 encoder and decoder compiled to WebAssembly) ships no types.
declare module "wawoff2" {
  export function compress(ttf: Uint8Array): Promise<Uint8Array>;
  export function decompress(woff2: Uint8Array): Promise<Uint8Array>;
}
