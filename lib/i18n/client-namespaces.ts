/**
 * The catalog namespaces components can read in the browser (the useTranslations hook). Only these
 * travel to the browser with every page (app/layout.tsx); the rest — mail, PDFs, server refusals,
 * content labels read on the server — stay on the server. tests/unit/i18n-catalogs.test.ts fails when
 * a component reads a namespace that is not listed here.
 */
export const CLIENT_NAMESPACES = [
  "account", "admin", "adminConsole", "auth", "billing", "calcReports", "certificates", "editions", "errors", "fieldErrors", "learn", "lesson",
  "marketing", "modules", "offline", "quiz", "search", "shell", "signoffs", "system", "team", "tools", "ui", "verify",
] as const;
