// Evidence uploads: a per-person allowance counted in MariaDB (429 with Retry-After once used up,
// nothing stored), and PDFs that always come back as downloads, never shown inline on Riser's origin.
import { eq } from "drizzle-orm";
import { PDFDocument } from "pdf-lib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { signOff } from "@/db/schema";
import { UPLOADS_PER_WINDOW } from "@/lib/signoffs/submit";
import { freshIp, signIn, type Client } from "../helpers/http";
import { TEST_PASSWORD, createOrganization, createPeople } from "../helpers/fixtures";

let org: { id: string; teamId: string };
const person = async (tag: string) => {
  const [p] = await createPeople(1, { organizationId: org.id, teamId: org.teamId, tag });
  return { ...p!, client: await signIn(p!.email, TEST_PASSWORD, freshIp()) };
};
beforeAll(async () => {
  org = await createOrganization("Upload Limits Fire Co");
});
afterAll(() => pool.end());

async function send(client: Client, files: { name: string; bytes: Uint8Array; type: string }[], skill = "pj-support-and-restrain") {
  const form = new FormData();
  form.set("module", "pipe-and-joining");
  form.set("skill", skill);
  for (const f of files) form.append("files", new Blob([Buffer.from(f.bytes)], { type: f.type }), f.name);
  const res = await client.fetch("/api/sign-offs", { method: "POST", body: form });
  const text = await res.text();
  return { status: res.status, headers: res.headers, json: JSON.parse(text || "{}") as Record<string, unknown> };
}

async function tinyPdf() {
  const doc = await PDFDocument.create();
  doc.addPage([200, 200]).drawText("Hydrostatic test record (test)", { x: 10, y: 100, size: 8 });
  return new Uint8Array(await doc.save());
}

describe("upload allowance", () => {
  it(`refuses the upload after ${UPLOADS_PER_WINDOW} in an hour with 429, Retry-After and a clear message, storing nothing`, async () => {
    const me = await person("upload-rate");
    // cheap refused uploads (an empty file) still count: each one had to be received
    for (let i = 0; i < UPLOADS_PER_WINDOW; i++) {
      const r = await send(me.client, [{ name: "empty.jpg", bytes: new Uint8Array(0), type: "image/jpeg" }]);
      expect(r.status, `upload ${i + 1}`).toBe(400);
    }
    const over = await send(me.client, [{ name: "record.pdf", bytes: await tinyPdf(), type: "application/pdf" }]);
    expect(over.status).toBe(429);
    expect(Number(over.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(over.json.error).toMatch(/uploads within an hour/);
    expect(await db.select().from(signOff).where(eq(signOff.userId, me.id))).toHaveLength(0);
    // another person is not affected
    const other = await person("upload-rate-other");
    expect((await send(other.client, [{ name: "record.pdf", bytes: await tinyPdf(), type: "application/pdf" }])).status).toBe(201);
  });
});

describe("evidence PDFs", () => {
  it("are served as attachments, also without ?download=1", async () => {
    const me = await person("pdf-attach");
    const r = await send(me.client, [{ name: "test record.pdf", bytes: await tinyPdf(), type: "application/pdf" }]);
    expect(r.status).toBe(201);
    const ev = (r.json.evidence as { id: string }[])[0]!;
    const res = await me.client.fetch(`/api/sign-offs/${r.json.id}/evidence/${ev.id}`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment;/);
    await res.arrayBuffer();
  });
});
