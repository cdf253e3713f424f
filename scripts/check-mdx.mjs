// Compiles MDX files (lessons, cards) with the same remark plugins as the app, to catch syntax
// errors early: `node scripts/check-mdx.mjs content/modules/*/*.mdx content/reference/*.mdx`.
import { readFileSync } from "node:fs";
import { compile } from "@mdx-js/mdx";
import remarkFrontmatter from "remark-frontmatter";
import remarkGfm from "remark-gfm";
import matter from "gray-matter";

let failed = 0;
for (const file of process.argv.slice(2)) {
  const source = readFileSync(file, "utf8");
  try {
    matter(source);
    await compile(source, { remarkPlugins: [remarkFrontmatter, remarkGfm] });
    const words = matter(source).content.replace(/<[^>]+>/g, " ").split(/\s+/).filter(Boolean).length;
    console.log(`ok   ${file} (${words} words)`);
  } catch (err) {
    failed++;
    console.log(`FAIL ${file}: ${err.message}`);
  }
}
process.exit(failed ? 1 : 0);
