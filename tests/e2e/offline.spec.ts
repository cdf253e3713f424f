// Job-site mode in the browser, in one pass to keep browser time small: what another person left on
// the phone is gone at sign-in; keep a module, read it and use a calculator with no connection, mark
// a lesson complete offline and send it when back online; a changed module replaces its stale copy;
// a reader who switches to Spanish gets the kept copy again in Spanish; signing out leaves nothing readable.
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import mysql from "mysql2/promise";
import { readFileSync } from "node:fs";
import path from "node:path";
import { loadCatalogFrom } from "../../lib/content/load";
import { backdateOpens, signInAs, throwAwayLearner } from "./helpers";

const MODULE = "freeze-protection";
const LESSON = `/modules/${MODULE}/where-homes-freeze`;
/** The Spanish twin's title (content/es) and the Spanish shell's sign-out words (messages/es). */
const ES_LESSON_TITLE = loadCatalogFrom("content").es.lessons[`${MODULE}/where-homes-freeze`]!.title;
const esCatalog = (ns: string) => JSON.parse(readFileSync(path.join(process.cwd(), "messages", "es", `${ns}.json`), "utf8"));
const ES_SIGN_OUT = esCatalog("shell").signOut as string;
const ES_OFFLINE = esCatalog("offline") as { keep: string; removeLabel: string; keptLine: string };
const ES_MODULE_TITLE = loadCatalogFrom("content").es.modules[MODULE]!.title;
const LESSONS = loadCatalogFrom("content").modules.find((m) => m.slug === MODULE)!.lessons.map((l) => `/modules/${MODULE}/${l.slug}`);

/** Riser's own storage on this phone: kept-page caches and the keys IndexedDB holds. */
async function phoneStorage(page: Page) {
  return page.evaluate(async () => {
    // Clear-Site-Data also holds the cache storage while the browser clears it (seconds on a loaded
    // machine): answer "not yet" instead of waiting, so that the poll asks again
    const busy = <T,>(p: Promise<T>, fallback: T) => Promise.race([p, new Promise<T>((resolve) => setTimeout(() => resolve(fallback), 1000))]);
    const cacheNames = (await busy(caches.keys(), ["(cache storage busy)"])).filter((n) => n.startsWith("riser-saved-") || n.includes("busy"));
    const keys = await new Promise<string[]>((resolve) => {
      // right after sign-out the browser may still be clearing the site's storage (Clear-Site-Data),
      // which holds this open back: answer "not yet" so that the poll asks again
      setTimeout(() => resolve(["(storage busy)"]), 1000);
      const open = indexedDB.open("riser-offline");
      open.onupgradeneeded = () => open.result.createObjectStore("kv");
      open.onsuccess = () => {
        const req = open.result.transaction("kv", "readonly").objectStore("kv").getAllKeys();
        req.onsuccess = () => resolve(req.result.map(String));
      };
    });
    return { cacheNames, keys: keys.filter((k) => k !== "owner") };
  });
}

/** Writes one IndexedDB value the way lib/offline stores it (idb-keyval: database riser-offline, store kv). */
async function putValue(page: Page, key: string, value: unknown) {
  await page.evaluate(
    ([k, v]) =>
      new Promise<void>((resolve) => {
        const open = indexedDB.open("riser-offline");
        open.onupgradeneeded = () => open.result.createObjectStore("kv");
        open.onsuccess = () => {
          open.result.transaction("kv", "readwrite").objectStore("kv").put(v, k as string).onsuccess = () => resolve();
        };
      }),
    [key, value] as const,
  );
}

async function getValue<T>(page: Page, key: string): Promise<T | undefined> {
  return page.evaluate(
    (k) =>
      new Promise<T | undefined>((resolve) => {
        const open = indexedDB.open("riser-offline");
        open.onsuccess = () => {
          const req = open.result.transaction("kv", "readonly").objectStore("kv").get(k);
          req.onsuccess = () => resolve(req.result as T | undefined);
        };
      }),
    key,
  );
}

async function cachedLesson(page: Page): Promise<string | null> {
  return page.evaluate(async (lesson) => {
    const name = (await caches.keys()).find((n) => n.startsWith("riser-saved-freeze-protection@"));
    const res = name ? await (await caches.open(name)).match(lesson) : undefined;
    return res ? res.text() : null;
  }, LESSON);
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

test("job-site mode: keep, read and calculate offline, queue and send a mark, replace a stale copy, and leave nothing for the next person", async ({ page, context }) => {
  test.setTimeout(150_000);
  const email = await throwAwayLearner();
  await signInAs(page, email);

  // What a previous person kept on this phone (they never signed out) is gone once this one signs in.
  await page.evaluate(async () => {
    await (await caches.open("riser-saved-pipe-and-joining@0000000000000000")).put("/modules/pipe-and-joining", new Response("their page"));
  });
  await putValue(page, "owner", "someone-else");
  await putValue(page, "queue:pipe-and-joining/x", { module: "pipe-and-joining", lesson: "x", readingSeconds: 60, markedAt: new Date().toISOString() });
  await page.goto(`/modules/${MODULE}`);
  await expect.poll(() => phoneStorage(page)).toEqual({ cacheNames: [], keys: [] });

  await page.evaluate(() => navigator.serviceWorker.ready);
  // Chromium's own installability check (the one Lighthouse's installable-manifest audit reports);
  // "in-incognito" is Playwright's throw-away profile, not the app.
  const cdp = await context.newCDPSession(page);
  const { installabilityErrors } = await cdp.send("Page.getInstallabilityErrors");
  expect(installabilityErrors.map((e) => e.errorId).filter((id) => id !== "in-incognito")).toEqual([]);
  await page.getByRole("button", { name: "Keep on this phone" }).click();
  await expect(page.getByTestId("kept-status")).toContainText("Kept on this phone", { timeout: 30_000 });
  const axe = () => new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"]).analyze();
  expect((await axe()).violations.map((v) => `module page: ${v.id} ${v.nodes[0]?.target}`)).toEqual([]);
  const version = (await getValue<{ version: string }>(page, `saved:${MODULE}`))!.version;
  expect(version).toMatch(/^[0-9a-f]{16}$/);

  // Online results, to compare with the offline ones.
  await page.goto(LESSON);
  const title = await page.getByRole("heading", { level: 1 }).textContent();
  // Q = K√P = 5.6 × √16 = 22.4 gpm (NFPA 13D discharge relation; arithmetic exact)
  await expect(await sprinklerFlow(page)).toContainText("22.4");

  await context.setOffline(true);
  // every lesson of the module opens from the phone (the kept copy, with its heading)
  for (const other of LESSONS) {
    await page.goto(other);
    await expect(page.getByTestId("needs-connection"), other).toHaveCount(0);
    await expect(page.locator("main h1"), other).toBeVisible();
  }
  await page.goto(LESSON);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText(title!);
  await expect(page.getByTestId("connection-notice")).toContainText("No connection");
  await page.getByRole("button", { name: "Mark this lesson complete" }).click();
  await expect(page.getByTestId("mark-waiting")).toContainText("waiting to be sent");
  await expect(await sprinklerFlow(page)).toContainText("22.4");
  // A quiz is graded on the server, certificates and the team board are per person: offline each
  // says so instead of pretending.
  for (const online of [`/modules/${MODULE}/quiz`, "/certificates", "/team"]) {
    await page.goto(online);
    await expect(page.getByTestId("needs-connection"), online).toContainText("needs a connection");
  }
  await page.goto("/offline");
  await expect(page.getByTestId("kept-list")).toContainText("Freeze");
  // the waiting mark names the lesson as the learner read it, not its address
  await expect(page.getByTestId("queue-list")).toContainText(title!);
  await expect(page.getByTestId("queue-list")).not.toContainText("where-homes-freeze");
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

  // A copy kept from older content (older version, older lesson text) is replaced once online.
  await page.evaluate(async (lesson) => {
    const name = (await caches.keys()).find((n) => n.startsWith("riser-saved-freeze-protection@"))!;
    await (await caches.open(name)).put(lesson, new Response("<h1>stale copy of the lesson</h1>", { headers: { "content-type": "text/html" } }));
  }, LESSON);
  const saved = (await getValue<Record<string, unknown>>(page, `saved:${MODULE}`))!;
  await putValue(page, `saved:${MODULE}`, { ...saved, version: "0000000000000000" });
  await page.reload();
  await expect.poll(async () => (await getValue<{ version: string }>(page, `saved:${MODULE}`))?.version, { timeout: 20_000 }).toBe(version);
  expect(await cachedLesson(page)).toContain(title!);
  expect(await cachedLesson(page)).not.toContain("stale copy");
  expect((await phoneStorage(page)).cacheNames).toHaveLength(1);

  // The reader switches to Spanish: the kept copy is now stale and comes back in Spanish.
  const switched = await page.request.post("/api/account/language", { data: { language: "es" }, headers: { origin: new URL(page.url()).origin } });
  expect(switched.status()).toBe(200);
  await page.reload();
  await expect.poll(async () => (await getValue<{ locale?: string }>(page, `saved:${MODULE}`))?.locale, { timeout: 20_000 }).toBe("es");
  expect(await cachedLesson(page)).toContain(ES_LESSON_TITLE);
  expect(await cachedLesson(page)).toContain('lang="es-US"');
  expect((await phoneStorage(page)).cacheNames).toHaveLength(1);

  // The offline page lists the kept module with its page count, size and date, and removes it.
  await page.goto("/offline");
  const kept = page.getByTestId("kept-list").getByRole("listitem").filter({ hasText: ES_MODULE_TITLE });
  // the catalog's line with the number of pages the server's plan lists, a size and a date
  const pages = ((await (await page.request.get(`/api/offline/modules/${MODULE}`)).json()) as { urls: string[] }).urls.length;
  const line = ES_OFFLINE.keptLine.replace("{pages}", String(pages)).replace("{size}", "[\\d.]+ (B|KB|MB)").replace("{when}", ".*\\d");
  await expect(kept).toContainText(new RegExp(line));
  await kept.getByRole("button", { name: ES_OFFLINE.removeLabel.replace("{title}", ES_MODULE_TITLE) }).click();
  await expect(page.getByTestId("kept-list")).toHaveCount(0);
  await expect.poll(() => phoneStorage(page)).toEqual({ cacheNames: [], keys: [] });
  // kept again (in Spanish) for the sign-out check below
  await page.goto(`/modules/${MODULE}`);
  await page.getByRole("button", { name: ES_OFFLINE.keep }).click();
  await expect.poll(async () => (await phoneStorage(page)).cacheNames.length, { timeout: 30_000 }).toBe(1);

  // Sign out: kept pages and queue are gone, and the lesson is not readable from this phone.
  await page.getByRole("button", { name: ES_SIGN_OUT }).click();
  await page.waitForURL((u) => u.pathname === "/");
  // the browser clears the site's storage (Clear-Site-Data) in the background: allow it the time it
  // takes on a loaded machine; what must hold is unchanged — nothing is left
  await expect.poll(() => phoneStorage(page), { timeout: 30_000 }).toEqual({ cacheNames: [], keys: [] });
  await context.setOffline(true);
  await page.goto(LESSON).catch(() => undefined);
  await expect(page.locator("body")).not.toContainText(title!);
  await expect(page.locator("body")).not.toContainText(ES_LESSON_TITLE);
});
