import path from "node:path";
import { defineConfig } from "vitest/config";

const alias = {
  "@": path.resolve(import.meta.dirname),
  // server-only guards Next bundles; in tests the modules run in Node directly.
  "server-only": path.resolve(import.meta.dirname, "tests/helpers/empty.ts"),
};

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      { resolve: { alias }, test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node" } },
      {
        resolve: { alias },
        test: { name: "integration", include: ["tests/integration/**/*.test.ts"], environment: "node", fileParallelism: false, testTimeout: 60_000, hookTimeout: 60_000 },
      },
      {
        resolve: { alias },
        test: { name: "faults", include: ["tests/faults/**/*.test.ts"], environment: "node", fileParallelism: false, testTimeout: 90_000, hookTimeout: 90_000 },
      },
    ],
  },
});
