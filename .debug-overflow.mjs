import { chromium } from "@playwright/test";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu"] });
const ctx = await browser.newContext({ viewport: { width: 360, height: 800 }, extraHTTPHeaders: { "x-forwarded-for": "10.93.0.1" }, baseURL: "http://127.0.0.1:3130" });
const page = await ctx.newPage();
await page.goto("/sign-in"); await page.waitForLoadState("networkidle");
await page.getByLabel("E-mail").fill("admin@riser.example");
await page.getByLabel("Password").fill("riser-demo-2026");
await page.getByRole("button", { name: "Sign in" }).click();
await page.waitForURL("**/learn");
for (const url of process.argv.slice(2)) {
  await page.goto(url); await page.waitForLoadState("networkidle"); await page.waitForTimeout(500);
  const r = await page.evaluate(() => {
    const W = document.documentElement.clientWidth;
    const out = [];
    for (const el of document.querySelectorAll("body *")) {
      const b = el.getBoundingClientRect();
      if (b.right > W + 1 && el.closest("[role=region]") === null) out.push(`${el.tagName}.${(el.className?.toString?.() ?? "").slice(0, 60)} right=${Math.round(b.right)}`);
    }
    return { overflow: document.documentElement.scrollWidth - W, out: out.slice(0, 12) };
  });
  console.log(url, JSON.stringify(r, null, 1));
}
await browser.close();
