import { defineConfig } from "@playwright/test";

// Debian's chromium; Playwright downloads no browser. One worker on 2 cores.
export default defineConfig({
  testDir: "tests/e2e",
  workers: 1,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [["list"]],
  use: {
    baseURL: process.env.APP_URL ?? "http://127.0.0.1:3100",
    launchOptions: {
      executablePath: "/usr/bin/chromium",
      args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
    },
    headless: true,
    trace: "off",
    screenshot: "only-on-failure",
  },
});
