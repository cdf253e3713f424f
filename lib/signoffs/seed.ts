import "server-only";
/**
 * Demo sign-offs (invented people of db/demo.ts), stored through the same object store as real
 * uploads so that the review queue and the learner pages show every state:
 *   Kasimir Dunleavy — CPVC joint and yearly alarm test approved by Maren Ostrowe (he holds those
 *                      modules' certificates in the demo data);
 *   Dario            — CPVC joint waiting for review, with a photo and a note;
 *   Ines             — yearly alarm test returned with a comment;
 *   Nadia (Larkhaven)— model-home walk-through waiting for Hollis.
 * The pictures are drawn here (no real photos). Skipped when any sign-off exists or no store is set.
 */
import { randomUUID } from "node:crypto";
import { inArray } from "drizzle-orm";
import sharp from "sharp";
import { db } from "@/db/client";
import { signOff, signOffEvidence, user } from "@/db/schema";
import { env } from "@/lib/env";
import { putObject } from "@/lib/storage";
import { evidenceKeys } from "./keys";
import { DAY_MS } from "@/lib/dates";
import { log } from "@/lib/log";


/** A drawn stand-in for a job-site photo: two pipe runs meeting at a fitting, with a caption band. */
async function demoPicture(caption: string, hue: string): Promise<{ body: Buffer; thumb: Buffer }> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="900">
  <rect width="1200" height="900" fill="#d9d2c3"/>
  <rect x="0" y="380" width="1200" height="90" fill="${hue}"/>
  <rect x="540" y="340" width="120" height="170" rx="14" fill="#8a7f6b"/>
  <rect x="560" y="0" width="80" height="350" fill="${hue}"/>
  <rect x="0" y="760" width="1200" height="140" fill="#14202B"/>
  <text x="40" y="845" font-family="sans-serif" font-size="48" fill="#F7F4EE">${caption}</text>
</svg>`;
  const base = sharp(Buffer.from(svg));
  return { body: await base.clone().jpeg({ quality: 82 }).toBuffer(), thumb: await base.clone().resize(480, 480, { fit: "inside" }).jpeg({ quality: 75 }).toBuffer() };
}

type DemoSignOff = {
  email: string;
  module: string;
  skill: string;
  status: "submitted" | "approved" | "returned";
  note: string;
  daysAgo: number;
  reviewer?: string;
  comment?: string;
  caption: string;
  fileName: string;
};

const DEMO: DemoSignOff[] = [
  {
    email: "kasimir@quillmoor.example",
    module: "pipe-and-joining",
    skill: "pj-cpvc-joint-and-cure",
    status: "approved",
    note: "Last joint 9:40, about 60 °F in the garage; cure log on the clipboard in the photo.",
    daysAgo: 50,
    reviewer: "maren@quillmoor.example",
    comment: "Clean bevel and full insertion; cure chart value written down before the test was booked.",
    caption: "Demo picture — CPVC tee, Juniper Flats lot 14",
    fileName: "lot14-cpvc-tee.jpg",
  },
  {
    email: "kasimir@quillmoor.example",
    module: "inspection-testing-maintenance",
    skill: "itm-yearly-alarm-test",
    status: "approved",
    note: "Monitoring company put on test first; bell heard in both bedrooms.",
    daysAgo: 30,
    reviewer: "maren@quillmoor.example",
    comment: "Test record complete, monitoring restored and noted.",
    caption: "Demo picture — test connection flowing",
    fileName: "alarm-test.jpg",
  },
  {
    email: "dario@quillmoor.example",
    module: "pipe-and-joining",
    skill: "pj-cpvc-joint-and-cure",
    status: "submitted",
    note: "Branch line joint in the hall ceiling, Juniper Flats lot 9. Cure log attached on the photo.",
    daysAgo: 2,
    caption: "Demo picture — CPVC coupling, Juniper Flats lot 9",
    fileName: "lot9-coupling.jpg",
  },
  {
    email: "ines@quillmoor.example",
    module: "inspection-testing-maintenance",
    skill: "itm-yearly-alarm-test",
    status: "returned",
    note: "Yearly test at the model home.",
    daysAgo: 6,
    reviewer: "maren@quillmoor.example",
    comment: "The record does not show how long the alarm took to sound, and nothing says the monitoring account was restored. Add both and send it again.",
    caption: "Demo picture — alarm test record",
    fileName: "model-home-test.jpg",
  },
  {
    email: "nadia@larkhaven.example",
    module: "talking-with-homebuyers",
    skill: "th-model-home-tour",
    status: "submitted",
    note: "Walk-through with a practice buyer at the Juniper Flats model home.",
    daysAgo: 1,
    caption: "Demo picture — model home living room",
    fileName: "model-home-tour.jpg",
  },
];

export async function seedSignOffs(now: Date = new Date()): Promise<void> {
  const [any] = await db.select({ id: signOff.id }).from(signOff).limit(1);
  if (any) return log().info("seed: sign-offs exist, left as they are");
  if (!env.S3_BUCKET) return log().info("seed: no object store configured (S3_BUCKET), no demo sign-offs");
  const emails = [...new Set(DEMO.flatMap((d) => [d.email, d.reviewer].filter((e): e is string => Boolean(e))))];
  const people = await db.select({ id: user.id, email: user.email, organizationId: user.organizationId }).from(user).where(inArray(user.email, emails));
  const by = new Map(people.map((p) => [p.email, p]));
  let count = 0;
  for (const d of DEMO) {
    const learner = by.get(d.email);
    const reviewer = d.reviewer ? by.get(d.reviewer) : undefined;
    if (!learner || (d.reviewer && !reviewer)) continue;
    const id = randomUUID();
    const evidenceId = randomUUID();
    const submittedAt = new Date(now.getTime() - d.daysAgo * DAY_MS);
    const pic = await demoPicture(d.caption, d.module === "pipe-and-joining" ? "#e9e4d0" : "#b42318");
    const keys = evidenceKeys(learner.id, id, evidenceId, "jpg", true);
    await putObject(keys.objectKey, pic.body, "image/jpeg");
    await putObject(keys.thumbnailKey!, pic.thumb, "image/jpeg");
    await db.transaction(async (tx) => {
      await tx.insert(signOff).values({
        id,
        userId: learner.id,
        organizationId: learner.organizationId,
        moduleSlug: d.module,
        skillId: d.skill,
        status: d.status,
        note: d.note,
        activeKey: d.status === "returned" ? null : `${learner.id}|${d.module}|${d.skill}`,
        submittedAt,
        reviewerId: reviewer?.id ?? null,
        reviewComment: d.comment ?? null,
        reviewedAt: reviewer ? new Date(submittedAt.getTime() + DAY_MS) : null,
      });
      await tx.insert(signOffEvidence).values({ id: evidenceId, signOffId: id, position: 0, ...keys, contentType: "image/jpeg", size: pic.body.byteLength, originalName: d.fileName, createdAt: submittedAt });
    });
    count++;
  }
  log().info(`seed: demo sign-offs: ${count}`);
}
