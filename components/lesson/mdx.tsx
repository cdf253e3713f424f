import type { MDXComponents } from "mdx/types";
import Link from "next/link";
import { CalculatorEmbed as Calculator } from "@/components/tools/calculator-embed";
import { Callout } from "./callout";
import { editionComponents } from "./edition";
import { Figure, WorkedExample } from "./figure";
import { Term } from "./term";

/** Components every lesson and card may use without importing them. */
export const lessonComponents: MDXComponents = {
  Callout,
  Figure,
  WorkedExample,
  Term,
  Calculator,
  // no edition chosen: every passage shows, labelled (pages bind the reader's edition instead)
  ...editionComponents(null),
  a: ({ href = "", children, ...rest }) =>
    href.startsWith("/") ? (
      <Link href={href} {...rest}>
        {children}
      </Link>
    ) : (
      <a href={href} rel="noreferrer" {...rest}>
        {children}
      </a>
    ),
};
