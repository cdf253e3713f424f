// Job-site mode in the browser: keep a module, read it and use a calculator with no connection,
// mark a lesson complete offline, send it when back online; a changed module replaces its stale
// copy; signing out leaves nothing readable for the next person.
import { expect, test, type Page } from "@playwright/test";
import mysql from "mysql2/promise";
import { backdateOpens, signInAs, throwAwayLearner } from "./helpers";

const MODULE = "freeze-protection";
const LESSON = `/modules/${MODULE}/where-homes-freeze`;

/** Riser's own storage on this phone: kept-page caches and what IndexedDB holds. */
async function phoneStorage(page: Page) {
  return page.evaluate(async () => {
    const cacheNames = (await caches.keys()).filter((n) => n.startsWith("riser-saved-"));
    const keys = await new Promise<string[]>((resolve) => {
      const open = indexedDB.open("riser-offline");
      open.onupgradeneeded = () => open.result.createObjectStore("kv");
      open.onsuccess = () => {
        const tx = open.result.transaction("kv", "readonly").objectStore("kv").getAllKeys();
        tx.onsuccess = () => resolve(tx.result.map(String));
      };
    });
    return { cacheNames, keys };
  });
}

async function progressRows(email: string) {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    const [rows] = await conn.query(
      "select p.device_reading_seconds as seconds from lesson_progress p join user u on u.id = p.user_id join catalog_lesson l on l.id = p.lesson_id where u.email = ? and l.slug = 'where-homes-freeze'",
      [email],
    );
    return rows as { seconds: number | null }[];
  } finally {
    await conn.end();
  }
}

async function sprinklerFlow(page: Page) {
  await page.goto("/tools/sprinkler-flow");
  await page.getByLabel(/^K-factor/).fill("5.6");
  await page.getByLabel(/^Pressure at the sprinkler/).fill("16");
  return page.locator('[data-result="headline"]');
}

test("keep a module, read it and calculate offline, queue a mark, send it online, then sign out and leave nothing", async ({ page, context }) => {
  test.setTimeout(90_000);
  const email = await throwAwayLearner();
  await signInAs(page, email);
  await page.goto(`/modules/${MODULE}`);
  await page.evaluate(() => navigator.serviceWorker.ready);
  // Chromium's own installability check (the one Lighthouse's installable-manifest audit reports);
  // "in-incognito" is Playwright's throw-away profile, not the app.
  const cdp = await context.newCDPSession(page);
  const { installabilityErrors } = await cdp.send("Page.getInstallabilityErrors");
  expect(installabilityErrors.map((e) => e.errorId).filter((id) => id !== "in-incognito")).toEqual([]);
  await page.getByRole("button", { name: "Keep on this phone" }).click();
  await expect(page.getByTestId("kept-status")).toContainText("Kept on this phone", { timeout: 30_000 });

  // Online results, to compare with the offline ones.
  await page.goto(LESSON);
  const title = await page.getByRole("heading", { level: 1 }).textContent();
  // Q = K√P = 5.6 × √16 = 22.4 gpm (NFPA 13D discharge relation; arithmetic exact)
  await expect(await sprinklerFlow(page)).toContainText("22.4");

  await context.setOffline(true);
  await page.goto(LESSON);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText(title!);
  await expect(page.getByTestId("connection-notice")).toContainText("No connection");
  await page.getByRole("button", { name: "Mark this lesson complete" }).click();
  await expect(page.getByTestId("mark-waiting")).toContainText("waiting to be sent");
  await expect(await sprinklerFlow(page)).toContainText("22.4");
  // A quiz is graded on the server: offline it says so instead of pretending.
  await page.goto(`/modules/${MODULE}/quiz`);
  await expect(page.getByTestId("needs-connection")).toContainText("needs a connection");
  await page.goto("/offline");
  await expect(page.getByTestId("kept-list")).toContainText("Freeze");
  await expect(page.getByTestId("queue-list")).toContainText("where-homes-freeze");
  expect(await progressRows(email)).toHaveLength(0);

  // Back online after the reading time (the server's own first-open stamp, moved back).
  await backdateOpens(email);
  await context.setOffline(false);
  await page.goto(LESSON);
  await expect(page.getByText("✓ Lesson complete")).toBeVisible();
  await expect(page.getByTestId("device-time")).toContainText("reported by the phone");
  await expect(page.getByTestId("mark-waiting")).toHaveCount(0);
  const rows = await progressRows(email);
  expect(rows).toHaveLength(1);
  expect(rows[0]!.seconds).not.toBeNull();

  // Sign out: kept pages and queue are gone, and the lesson is not readable from this phone.
  await page.getByRole("button", { name: "Sign out" }).click();
  await page.waitForURL((u) => u.pathname === "/");
  await expect.poll(async () => (await phoneStorage(page)).cacheNames).toEqual([]);
  expect((await phoneStorage(page)).keys.filter((k) => k.startsWith("saved:") || k.startsWith("queue:"))).toEqual([]);
  await context.setOffline(true);
  await page.goto(LESSON).catch(() => undefined);
  await expect(page.getByRole("heading", { level: 1 })).not.toHaveText(title!);
  await expect(page.locator("body")).not.toContainText(title!);
});

test("a kept module whose content version changed is replaced when online; the next person to sign in finds nothing kept", async ({ page }) => {
  test.setTimeout(60_000);
  await signInAs(page, await throwAwayLearner());
  await page.goto(`/modules/${MODULE}`);
  await page.evaluate(() => navigator.serviceWorker.ready);
  await page.getByRole("button", { name: "Keep on this phone" }).click();
  await expect(page.getByTestId("kept-status")).toBeVisible({ timeout: 30_000 });
  // As if the phone kept an older build of this content: an old version and an old lesson body.
  const before = await page.evaluate(async (lesson) => {
    const name = (await caches.keys()).find((n) => n.startsWith("riser-saved-freeze-protection@"))!;
    await (await caches.open(name)).put(lesson, new Response("<h1>stale copy of the lesson</h1>", { headers: { "content-type": "text/html" } }));
    return new Promise<string>((resolve) => {
      const open = indexedDB.open("riser-offline");
      open.onsuccess = () => {
        const store = open.result.transaction("kv", "readwrite").objectStore("kv");
        const get = store.get("saved:freeze-protection");
        get.onsuccess = () => {
          const version = get.result.version as string;
          store.put({ ...get.result, version: "0000000000000000" }, "saved:freeze-protection").onsuccess = () => resolve(version);
        };
      };
    });
  }, LESSON);
  await page.reload();
  const after = async () =>
    page.evaluate(async (lesson) => {
      const name = (await caches.keys()).find((n) => n.startsWith("riser-saved-freeze-protection@"));
      const res = name ? await (await caches.open(name)).match(lesson) : undefined;
      return res ? (await res.text()).includes("stale copy") : null;
    }, LESSON);
  const storedVersion = () =>
    page.evaluate(
      () =>
        new Promise<string>((resolve) => {
          const open = indexedDB.open("riser-offline");
          open.onsuccess = () => {
            const get = open.result.transaction("kv", "readonly").objectStore("kv").get("saved:freeze-protection");
            get.onsuccess = () => resolve(get.result.version);
          };
        }),
    );
  await expect.poll(storedVersion, { timeout: 20_000 }).toBe(before);
  expect(await after()).toBe(false);
  expect(await page.evaluate(() => caches.keys().then((k) => k.filter((n) => n.startsWith("riser-saved-")).length))).toBe(1);
  expect(before).toMatch(/^[0-9a-f]{16}$/);

  // Someone else signs in on this phone without the first person signing out: nothing is left for them.
  await signInAs(page, await throwAwayLearner());
  await expect.poll(async () => (await phoneStorage(page)).cacheNames).toEqual([]);
  await page.goto("/offline");
  await expect(page.getByText("Nothing yet.")).toBeVisible();
});
