import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";
import drizzle from "eslint-plugin-drizzle";

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
];
export default config;
