// Import rules for Riser, checked by `npm run lint` (dependency-cruiser).
// The code is layered app/ → components/ → lib/ → db/; each lib/<area> folder is an area with one
// public face: index.ts (server) and, where the browser needs types, schemas or pure helpers,
// browser.ts. Other areas, pages and components import only those two files.
/** @type {import('dependency-cruiser').IConfiguration} */
module.exports = {
  forbidden: [
    {
      name: "no-deep-imports-across-areas",
      severity: "error",
      comment: "Import another lib area through its face (lib/<area>/index.ts or browser.ts), never a file inside it.",
      from: { path: "^lib/([^/]+)/" },
      to: {
        path: "^lib/[^/]+/.+",
        pathNot: ["^lib/$1/", "^lib/[^/]+/(index|browser)\\.tsx?$", "^lib/search/generated/"],
      },
    },
    {
      name: "no-deep-imports-into-areas-from-outside",
      severity: "error",
      comment: "Pages, components, db and scripts use an area's face, never a file inside it.",
      from: { path: "^(app/|components/|db/|scripts/|proxy\\.ts|instrumentation\\.ts|mdx-components\\.tsx)" },
      to: { path: "^lib/[^/]+/.+", pathNot: ["^lib/[^/]+/(index|browser)\\.tsx?$", "^lib/search/generated/"] },
    },
    {
      name: "no-lib-to-ui",
      severity: "error",
      comment: "lib/ is below the UI: it never imports app/ or components/.",
      from: { path: "^lib/" },
      to: { path: "^(app|components)/" },
    },
    {
      name: "no-db-to-scripts",
      severity: "error",
      comment: "db/ is below the scripts that start it.",
      from: { path: "^db/" },
      to: { path: "^scripts/" },
    },
    {
      name: "no-components-to-app",
      severity: "error",
      from: { path: "^components/" },
      to: { path: "^app/" },
    },
    {
      name: "no-circular",
      severity: "error",
      comment: "No import cycles between modules (area cycles show up as cycles through their faces).",
      from: { path: "^(lib|db|app|components)/" },
      to: { circular: true, viaOnly: { dependencyTypesNot: ["type-only"] } },
    },
    {
      name: "no-area-cycles",
      severity: "error",
      comment: "Areas depend on each other in one direction only: no cycle between lib/<area> folders or db.",
      scope: "folder",
      from: { path: "^(lib/[^/]+|db)$" },
      to: { path: "^(lib/[^/]+|db)$", circular: true },
    },
  ],
  options: {
    doNotFollow: { path: ["node_modules"] },
    exclude: { path: ["^node_modules", "^\\.next", "^\\.data", "^content/\\.generated"] },
    tsPreCompilationDeps: true,
    tsConfig: { fileName: "tsconfig.json" },
    enhancedResolveOptions: {
      exportsFields: ["exports"],
      conditionNames: ["import", "require", "node", "default", "types"],
      extensions: [".ts", ".tsx", ".mjs", ".js", ".json", ".mdx"],
    },
    reporterOptions: { text: { highlightFocused: true } },
  },
};
