/**
 * A throwaway content tree for Spanish-loader tests: a copy of the English content/ with a Spanish
 * twin of every file made from the English text itself (only the fields a Spanish file may hold, as
 * content/es is laid out), each stamped with its English twin's hash. Structurally a perfect twin, so
 * a test can break one thing and see the loader or the twin check name it.
 */
import { cpSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import matter from "gray-matter";
import YAML from "yaml";
import { enHash, twinPairs, writeStamp } from "@/lib/content";

const pick = <T extends Record<string, unknown>>(o: T, keys: string[]) => Object.fromEntries(keys.filter((k) => o[k] !== undefined).map((k) => [k, o[k]]));

export function makeTwinTree(source = path.resolve("content")): string {
  const dir = path.join(mkdtempSync(path.join(tmpdir(), "riser-es-")), "content");
  cpSync(source, dir, { recursive: true, filter: (f) => !f.startsWith(path.join(source, "es")) && !f.includes(".generated") });
  rmSync(path.join(dir, "es"), { recursive: true, force: true });
  const english = englishFiles(dir);
  for (const p of twinPairs(english)) {
    const enText = readFileSync(path.join(dir, p.en), "utf8");
    let es: string;
    if (p.kind === "mdx") {
      const { data, content } = matter(enText);
      const keys = p.en.startsWith("reference/") ? ["title", "summary", "sources", "edition"] : ["title", "summary", "objectives", "sources", "edition", "changed"];
      es = matter.stringify(content, pick(data, keys));
    } else {
      const data = YAML.parse(enText) as Record<string, Record<string, unknown>[]> & Record<string, unknown>;
      const name = path.basename(p.en);
      const lists: Record<string, [string, string[]]> = {
        "quiz.yaml": ["questions", ["id", "prompt", "explanation", "options", "changed"]],
        "skills.yaml": ["skills", ["id", "title", "observe", "evidence"]],
        "glossary.yaml": ["terms", ["id", "term", "definition"]],
        "paths.yaml": ["paths", ["slug", "title", "summary"]],
      };
      const list = lists[name];
      es = YAML.stringify(list ? { [list[0]]: (data[list[0]] as Record<string, unknown>[]).map((x) => pick(x, list[1])) } : pick(data, ["title", "summary"]));
    }
    const file = path.join(dir, p.es);
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(file, writeStamp(es, enHash(enText), p.kind));
  }
  return dir;
}

/** What twinPairs needs of the English tree (modules with lesson slugs and skills, card slugs), read without the loader. */
function englishFiles(dir: string): Parameters<typeof twinPairs>[0] {
  const modules = readdirSync(path.join(dir, "modules")).map((m) => {
    const meta = YAML.parse(readFileSync(path.join(dir, "modules", m, "module.yaml"), "utf8")) as { lessons: string[] };
    const skills = existsSync(path.join(dir, "modules", m, "skills.yaml")) ? [{}] : [];
    return { slug: m, lessons: meta.lessons.map((slug) => ({ slug })), skills };
  });
  const cards = readdirSync(path.join(dir, "reference")).filter((f) => f.endsWith(".mdx")).map((f) => ({ slug: f.replace(/\.mdx$/, "") }));
  return { modules, cards } as unknown as Parameters<typeof twinPairs>[0];
}
