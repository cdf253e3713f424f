import type { MDXComponents } from "mdx/types";
import { lessonComponents } from "@/components/lesson/mdx";

export function useMDXComponents(components: MDXComponents): MDXComponents {
  return { ...lessonComponents, ...components };
}
