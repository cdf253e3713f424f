// The server half of "outages give 503, never 500" (scripts/lib/outage-answer.mjs), on a plain Node
// HTTP server standing in for Next's handler, so that every case is exact rather than caught by
// timing under load (tests/faults/outage-under-load.test.ts does that against the real app).
// Reference: RFC 9110 §15.6.1 (500: an unexpected condition) and §15.6.4 (503: temporarily unable,
// may send Retry-After, §10.2.3): a 5xx caused by a noted outage becomes 503 with a clear message;
// anything else, including a real 500 and an answer already on its way, is left exactly as it was.
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import { gzipSync } from "node:zlib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { noteOutage } from "@/lib/outage.mjs";
import { answerOutagesWith503, installOutageSlot } from "../../scripts/lib/outage-answer.mjs";

type Handler = (req: IncomingMessage, res: ServerResponse) => void | Promise<void>;
const handlers = new Map<string, Handler>();
const later = () => new Promise((r) => setTimeout(r, 5));
let server: Server;
let base: string;

beforeAll(async () => {
  const outages = installOutageSlot();
  server = createServer((req, res) => {
    const slot = {};
    answerOutagesWith503(req, res, slot);
    void outages.run(slot, async () => handlers.get(new URL(req.url!, "http://x").pathname)!(req, res));
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const addr = server.address() as { port: number };
  base = `http://127.0.0.1:${addr.port}`;
});
afterAll(() => new Promise<void>((r) => server.close(() => r())));

async function get(path: string) {
  const res = await fetch(`${base}${path}`);
  return { status: res.status, headers: res.headers, text: await res.text() };
}

describe("an outage's 5xx becomes 503", () => {
  it("a page whose render failed on a database outage (status set, then end with the error page)", async () => {
    handlers.set("/learn", async (_req, res) => {
      await later(); // noted somewhere down the request's own async chain
      noteOutage("database");
      res.statusCode = 500;
      res.setHeader("content-type", "text/html");
      res.setHeader("content-length", "25");
      res.setHeader("x-content-type-options", "nosniff");
      res.end("<html>Internal err</html>");
    });
    const r = await get("/learn");
    expect(r.status).toBe(503);
    expect(r.headers.get("content-type")).toMatch(/text\/html/);
    expect(r.headers.get("retry-after")).toBe("10");
    expect(r.headers.get("x-content-type-options")).toBe("nosniff"); // the security headers stay
    expect(r.text).toContain("Riser is briefly unavailable");
    expect(r.text).toContain("database is");
    expect(r.text).not.toContain("Internal err");
  });

  it("a JSON route answering 500 through writeHead, write and end, compressed", async () => {
    handlers.set("/api/auth/get-session", (_req, res) => {
      noteOutage("database");
      const body = gzipSync(JSON.stringify({ message: "Failed to get session" }));
      res.setHeader("content-encoding", "gzip");
      res.writeHead(500, { "content-type": "application/json", "content-length": String(body.length) });
      res.write(body.subarray(0, 5));
      res.end(body.subarray(5));
    });
    const r = await get("/api/auth/get-session");
    expect(r.status).toBe(503);
    expect(r.headers.get("content-encoding")).toBeNull();
    expect(JSON.parse(r.text)).toEqual({ error: "Riser's database is not reachable right now. Try again in a minute." });
  });

  it("names the object store when that is what is down", async () => {
    handlers.set("/api/files", (_req, res) => {
      noteOutage("object store");
      res.statusCode = 502;
      res.end("bad gateway");
    });
    const r = await get("/api/files");
    expect(r.status).toBe(503);
    expect(JSON.parse(r.text).error).toMatch(/file store is not reachable/);
  });
});

describe("everything else is left as it was", () => {
  it("a 500 with no outage noted stays a 500 (a bug must show as one)", async () => {
    handlers.set("/bug", (_req, res) => {
      res.statusCode = 500;
      res.end("Internal err");
    });
    const r = await get("/bug");
    expect(r.status).toBe(500);
    expect(r.text).toBe("Internal err");
  });

  it("an outage noted on a request that still succeeds (or already streams) keeps its answer", async () => {
    handlers.set("/streaming", async (_req, res) => {
      res.writeHead(200, { "content-type": "text/html" });
      res.write("<p>shell</p>");
      await later();
      noteOutage("database");
      res.statusCode = 500; // too late: the status went out with the first bytes
      res.end("<p>error boundary</p>");
    });
    const r = await get("/streaming");
    expect(r.status).toBe(200);
    expect(r.text).toBe("<p>shell</p><p>error boundary</p>");
  });

  it("an outage noted on one request does not touch another running at the same time", async () => {
    handlers.set("/a", async (_req, res) => {
      noteOutage("database");
      await later();
      res.statusCode = 500;
      res.end("a failed");
    });
    handlers.set("/b", async (_req, res) => {
      await later();
      res.statusCode = 500;
      res.end("b failed");
    });
    const [a, b] = await Promise.all([get("/a"), get("/b")]);
    expect(a.status).toBe(503);
    expect(b).toMatchObject({ status: 500, text: "b failed" });
  });
});
