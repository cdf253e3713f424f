import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, desc, eq, ne } from "drizzle-orm";
import { z } from "zod";
import { db, type Tx } from "@/db/client";
import { jurisdiction, organization } from "@/db/schema";
import { canManageOrganization, type Viewer } from "@/lib/access";
import { audit } from "@/lib/audit";
import { DomainError } from "@/lib/errors";
import { isEdition, type EditionYear } from "@/lib/content";
import { jurisdictionSchema, jurisdictionUpdateSchema } from "./browser";

/**
 * The jurisdictions an organization works in, each with its adopted NFPA 13D edition and whether
 * IRC P2904 is in force. At most one is the default: the edition the organization's people are
 * taught to (lesson passages, quiz questions, certificates). The organization row is locked while
 * the default moves, so two managers saving at once never leave two defaults.
 */
export type JurisdictionRow = typeof jurisdiction.$inferSelect;
export type AdoptedCode = { edition: EditionYear; ircP2904: boolean; name: string; state: string };

export async function listJurisdictions(orgId: string): Promise<JurisdictionRow[]> {
  return db.select().from(jurisdiction).where(eq(jurisdiction.organizationId, orgId)).orderBy(desc(jurisdiction.isDefault), asc(jurisdiction.state), asc(jurisdiction.name));
}

/** The organization's default adopted code, or null when it has recorded none. */
export async function adoptedCode(orgId: string | null): Promise<AdoptedCode | null> {
  if (!orgId) return null;
  const [row] = await db
    .select()
    .from(jurisdiction)
    .where(and(eq(jurisdiction.organizationId, orgId), eq(jurisdiction.isDefault, true)))
    .limit(1);
  if (!row || !isEdition(row.edition)) return null;
  return { edition: row.edition, ircP2904: row.ircP2904, name: row.name, state: row.state };
}

const duplicate = (name: string, state: string) =>
  new DomainError("conflict", `${name}, ${state} is already on the list.`, { name: ["This jurisdiction is already on the list"] });

async function lockOrg(tx: Tx, orgId: string) {
  await tx.select({ id: organization.id }).from(organization).where(eq(organization.id, orgId)).for("update");
}

async function taken(tx: Tx, orgId: string, name: string, state: string, exceptId?: string) {
  const rows = await tx
    .select({ id: jurisdiction.id })
    .from(jurisdiction)
    .where(and(eq(jurisdiction.organizationId, orgId), eq(jurisdiction.name, name), eq(jurisdiction.state, state), exceptId ? ne(jurisdiction.id, exceptId) : undefined))
    .limit(1);
  return rows.length > 0;
}

export async function createJurisdiction(viewer: Viewer, orgId: string, raw: z.input<typeof jurisdictionSchema>, ip: string) {
  const input = jurisdictionSchema.parse(raw);
  const id = randomUUID();
  const now = new Date();
  await db.transaction(async (tx) => {
    await lockOrg(tx, orgId);
    if (await taken(tx, orgId, input.name, input.state)) throw duplicate(input.name, input.state);
    const existing = await tx.select({ id: jurisdiction.id }).from(jurisdiction).where(eq(jurisdiction.organizationId, orgId)).limit(1);
    const isDefault = input.isDefault || existing.length === 0; // the first one is the default
    if (isDefault) await tx.update(jurisdiction).set({ isDefault: false, updatedAt: now }).where(eq(jurisdiction.organizationId, orgId));
    await tx.insert(jurisdiction).values({ id, organizationId: orgId, name: input.name, state: input.state, edition: input.edition, ircP2904: input.ircP2904, isDefault, createdAt: now, updatedAt: now });
    await audit(
      { actor: viewer, organizationId: orgId, action: "jurisdiction.create", targetType: "jurisdiction", targetId: id, ip, details: { name: input.name, state: input.state, edition: input.edition, ircP2904: input.ircP2904, isDefault } },
      tx,
    );
  });
  return { id };
}

/** The row if the viewer manages its organization: unknown → 404, another organization's → 403. */
async function jurisdictionForViewer(viewer: Viewer, id: string): Promise<JurisdictionRow> {
  if (!/^[A-Za-z0-9-]{1,36}$/.test(id)) throw new DomainError("not-found", "No such jurisdiction.");
  const [row] = await db.select().from(jurisdiction).where(eq(jurisdiction.id, id));
  if (!row) throw new DomainError("not-found", "No such jurisdiction.");
  if (!canManageOrganization(viewer, row.organizationId)) throw new DomainError("forbidden", "That belongs to another organization.");
  return row;
}

export async function updateJurisdiction(viewer: Viewer, id: string, raw: z.input<typeof jurisdictionUpdateSchema>, ip: string) {
  const input = jurisdictionUpdateSchema.parse(raw);
  const row = await jurisdictionForViewer(viewer, id);
  const orgId = row.organizationId;
  const now = new Date();
  if (input.isDefault === false && row.isDefault) {
    throw new DomainError("invalid", "Make another jurisdiction the default instead.", { isDefault: ["One jurisdiction stays the default; choose another as default"] });
  }
  await db.transaction(async (tx) => {
    await lockOrg(tx, orgId);
    const name = input.name ?? row.name;
    const state = input.state ?? row.state;
    if ((name !== row.name || state !== row.state) && (await taken(tx, orgId, name, state, id))) throw duplicate(name, state);
    if (input.isDefault) await tx.update(jurisdiction).set({ isDefault: false, updatedAt: now }).where(and(eq(jurisdiction.organizationId, orgId), ne(jurisdiction.id, id)));
    const set = { ...input, updatedAt: now };
    await tx.update(jurisdiction).set(set).where(and(eq(jurisdiction.id, id), eq(jurisdiction.organizationId, orgId)));
    const changes = Object.fromEntries(Object.entries(input).map(([k, v]) => [k, { from: row[k as keyof JurisdictionRow], to: v }]));
    await audit({ actor: viewer, organizationId: orgId, action: "jurisdiction.update", targetType: "jurisdiction", targetId: id, ip, details: { name: row.name, state: row.state, changes } }, tx);
  });
  return { id };
}

export async function removeJurisdiction(viewer: Viewer, id: string, ip: string) {
  const row = await jurisdictionForViewer(viewer, id);
  const orgId = row.organizationId;
  await db.transaction(async (tx) => {
    await lockOrg(tx, orgId);
    await tx.delete(jurisdiction).where(and(eq(jurisdiction.id, id), eq(jurisdiction.organizationId, orgId)));
    if (row.isDefault) {
      // the oldest remaining one becomes the default, so the organization keeps a taught edition
      const [next] = await tx.select({ id: jurisdiction.id }).from(jurisdiction).where(eq(jurisdiction.organizationId, orgId)).orderBy(asc(jurisdiction.createdAt)).limit(1);
      if (next) await tx.update(jurisdiction).set({ isDefault: true, updatedAt: new Date() }).where(eq(jurisdiction.id, next.id));
    }
    await audit({ actor: viewer, organizationId: orgId, action: "jurisdiction.remove", targetType: "jurisdiction", targetId: id, ip, details: { name: row.name, state: row.state, edition: row.edition, wasDefault: row.isDefault } }, tx);
  });
  return { id, name: row.name };
}
