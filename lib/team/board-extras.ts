import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { certificate, signOff } from "@/db/schema";
import { dueFor } from "@/lib/refreshers";
import type { BoardCell, BoardRow } from "./board";

/**
 * What a board cell shows beyond its status: practical sign-offs waiting for the manager's
 * review, the serial of the certificate of the latest completion (module certificates only), and
 * whether a refresher is due after a material content change (the certificate stays valid).
 * Read for the people of one page or one CSV chunk, after the board rows are built.
 */
export type CellExtras = { waitingSignOffs: number; serial: string | null; refresherDue: boolean };
export type RichCell = BoardCell & CellExtras;
export type RichRow = Omit<BoardRow, "cells"> & { cells: Record<string, RichCell> };

export async function withCellExtras(rows: BoardRow[]): Promise<RichRow[]> {
  const ids = rows.map((r) => r.id);
  const waiting = new Map<string, number>();
  const serials = new Map<string, string>();
  const refreshers = await dueFor(ids);
  if (ids.length) {
    const [pending, certs] = await Promise.all([
      db
        .select({ userId: signOff.userId, moduleSlug: signOff.moduleSlug })
        .from(signOff)
        .where(and(inArray(signOff.userId, ids), eq(signOff.status, "submitted"))),
      db
        .select({ userId: certificate.userId, slug: certificate.subjectSlug, serial: certificate.serial })
        .from(certificate)
        .where(and(inArray(certificate.userId, ids), eq(certificate.kind, "module")))
        .orderBy(desc(certificate.issuedAt)),
    ]);
    for (const p of pending) waiting.set(`${p.userId}|${p.moduleSlug}`, (waiting.get(`${p.userId}|${p.moduleSlug}`) ?? 0) + 1);
    for (const c of certs) if (!serials.has(`${c.userId}|${c.slug}`)) serials.set(`${c.userId}|${c.slug}`, c.serial);
  }
  return rows.map((r) => ({
    ...r,
    cells: Object.fromEntries(
      Object.entries(r.cells).map(([slug, c]) => [slug, { ...c, waitingSignOffs: waiting.get(`${r.id}|${slug}`) ?? 0, serial: c.completedAt ? (serials.get(`${r.id}|${slug}`) ?? null) : null, refresherDue: refreshers.has(`${r.id}|${slug}`) }]),
    ),
  }));
}
