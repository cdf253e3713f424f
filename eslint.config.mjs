import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";
import drizzle from "eslint-plugin-drizzle";
import i18next from "eslint-plugin-i18next";

const config = [
  ...nextVitals,
  ...nextTs,
  {
    ignores: [".next/**", ".next-*/**", "node_modules/**", ".data/**", "db/migrations/**", "content/.generated/**", "next-env.d.ts", "test-results/**", "playwright-report/**"],
  },
  {
    plugins: { drizzle },
    rules: {
      "drizzle/enforce-delete-with-where": ["error", { drizzleObjectName: ["db", "tx"] }],
      "drizzle/enforce-update-with-where": ["error", { drizzleObjectName: ["db", "tx"] }],
    },
  },
  {
    // server code logs through lib/log (structured, ids only, e-mails masked); the browser may still use console
    files: ["lib/**/*.ts", "app/**/*.ts", "instrumentation.ts", "proxy.ts"],
    ignores: ["lib/**/browser.ts"],
    rules: { "no-console": "error" },
  },
  {
    // Every string a person reads comes from the message catalogs (messages/<locale>/*.json,
    // next-intl): no literal text between JSX tags, and no
    // literal words in the attributes people read (labels, titles, placeholders, alt text).
    files: ["app/**/*.tsx", "components/**/*.tsx"],
    plugins: { i18next },
    rules: {
      "i18next/no-literal-string": ["error", { mode: "jsx-text-only" }],
      "no-restricted-syntax": [
        "error",
        {
          selector: "JSXAttribute[name.name=/^(aria-label|aria-description|title|placeholder|alt|label)$/] > Literal[value=/[A-Za-z]{2,}/]",
          message: "Read text from the message catalog (next-intl), not a literal.",
        },
      ],
    },
  },
];
export default config;
