// Writes or refreshes the `en:` stamp of Spanish content files: the first 16 hex digits of the SHA-256
// of each file's English twin. Run it after checking that a translation matches the current English:
//   npm run content:stamp -- content/es/modules/<m>/<lesson>.mdx [more files…]
//   npm run content:stamp -- --all
// Only the `en:` line changes; the rest of each file is left byte for byte.
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { enHash, writeStamp } from "@/lib/content";

const root = path.resolve(process.env.RISER_CONTENT_DIR ?? "content");
const esRoot = path.join(root, "es");
const args = process.argv.slice(2);
if (!args.length) {
  console.error("usage: npm run content:stamp -- <content/es/… files> | --all");
  process.exit(2);
}

function spanishFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = path.join(dir, f);
    return statSync(p).isDirectory() ? spanishFiles(p) : /\.(mdx|ya?ml)$/.test(f) ? [p] : [];
  });
}

const files = args.includes("--all") ? (existsSync(esRoot) ? spanishFiles(esRoot) : []) : args.map((f) => path.resolve(f));
let failed = false;
for (const file of files) {
  const rel = path.relative(esRoot, file);
  if (rel.startsWith("..") || path.isAbsolute(rel)) {
    console.error(`${file}: not under ${path.relative(process.cwd(), esRoot)}/`);
    failed = true;
    continue;
  }
  const english = path.join(root, rel);
  if (!existsSync(file) || !existsSync(english)) {
    console.error(`${path.relative(process.cwd(), file)}: ${existsSync(file) ? `no English twin ${path.relative(process.cwd(), english)}` : "no such file"}`);
    failed = true;
    continue;
  }
  const before = readFileSync(file, "utf8");
  const after = writeStamp(before, enHash(readFileSync(english)), file.endsWith(".mdx") ? "mdx" : "yaml");
  if (after !== before) writeFileSync(file, after);
  console.log(`${after === before ? "unchanged" : "stamped"}  ${path.relative(process.cwd(), file)}`);
}
process.exit(failed ? 1 : 0);
