/**
 * The catalog namespaces components can read in the browser (the useTranslations hook), and where
 * they travel. The root layout (app/layout.tsx) sends BASE_NAMESPACES with every page; a section
 * that needs more wraps its subtree in <ScopedMessages scope="…"> (components/i18n/scoped-messages.tsx),
 * which adds that scope's namespaces to the ones around it, so a lesson page no longer carries the
 * team board's or the calculators' words. The rest — mail, PDFs, server refusals, content labels read
 * on the server — stay on the server. tests/unit/i18n-catalogs.test.ts follows the imports from every
 * route and fails when a browser component reads a namespace its providers do not carry.
 */
export const BASE_NAMESPACES = ["errors", "fieldErrors", "offline", "shell", "system", "ui"] as const;

export const SCOPED_NAMESPACES = {
  account: ["account", "auth"],
  admin: ["admin", "adminConsole", "team"],
  auth: ["auth", "team"],
  certificates: ["certificates"],
  learn: ["learn", "quiz"],
  // lessons and everything under a module; reference cards share the lesson components
  lessons: ["lesson"],
  // a module's quiz and its sign-offs add theirs (their layouts), so a lesson page carries neither
  quiz: ["quiz"],
  search: ["search"],
  signoffs: ["signoffs"],
  team: ["billing", "editions", "signoffs", "team"],
  // the calculator pages and every calculator embedded in a lesson or card; the report catalog
  // (calcReports) is not among them: it loads with the calculators' engine (components/tools/engine-loader.ts)
  tools: ["tools"],
  verify: ["verify"],
} as const satisfies Record<string, readonly string[]>;

export type MessageScope = keyof typeof SCOPED_NAMESPACES;

/** Every namespace that may reach the browser somewhere. */
export const CLIENT_NAMESPACES = [...new Set<string>([...BASE_NAMESPACES, ...Object.values(SCOPED_NAMESPACES).flat()])].sort();
