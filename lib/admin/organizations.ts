import "server-only";
import { randomUUID } from "node:crypto";
import { count, eq, like, sql } from "drizzle-orm";
import type { z } from "zod";
import { db } from "@/db/client";
import { organization, team, user } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { audit } from "@/lib/audit";
import { containing, iso, offsetOf, ordered } from "./paging";
import type { CreateOrganizationInput, organizationsQuery, Paged } from "./schemas";

export type OrganizationRow = {
  id: string;
  name: string;
  kind: string;
  seats: number;
  members: number;
  teams: number;
  trialEndsAt: string | null;
  createdAt: string | null;
};

type Actor = Pick<Viewer, "id" | "email">;

export async function listOrganizations(q: z.infer<typeof organizationsQuery>): Promise<Paged<OrganizationRow>> {
  const members = db.select({ orgId: user.organizationId, n: count().as("member_n") }).from(user).groupBy(user.organizationId).as("members");
  const teams = db.select({ orgId: team.organizationId, n: count().as("team_n") }).from(team).groupBy(team.organizationId).as("teams");
  const memberCount = sql<number>`coalesce(${members.n}, 0)`;
  const where = q.q ? like(organization.name, containing(q.q)) : undefined;
  const sortColumn = { name: organization.name, kind: organization.kind, seats: organization.seats, members: memberCount, createdAt: organization.createdAt }[q.sort];
  const rows = await db
    .select({
      id: organization.id,
      name: organization.name,
      kind: organization.kind,
      seats: organization.seats,
      members: memberCount,
      teams: sql<number>`coalesce(${teams.n}, 0)`,
      trialEndsAt: organization.trialEndsAt,
      createdAt: organization.createdAt,
    })
    .from(organization)
    .leftJoin(members, eq(members.orgId, organization.id))
    .leftJoin(teams, eq(teams.orgId, organization.id))
    .where(where)
    .orderBy(ordered(sortColumn, q.dir), ordered(organization.id, "asc"))
    .limit(q.pageSize)
    .offset(offsetOf(q));
  const [total] = await db.select({ n: count() }).from(organization).where(where);
  return {
    rows: rows.map((r) => ({ ...r, members: Number(r.members), teams: Number(r.teams), trialEndsAt: iso(r.trialEndsAt), createdAt: iso(r.createdAt) })),
    total: total?.n ?? 0,
    page: q.page,
    pageSize: q.pageSize,
  };
}

/** Every organization's id and name, for the people and audit filters. */
export async function organizationOptions(): Promise<{ id: string; name: string }[]> {
  return db.select({ id: organization.id, name: organization.name }).from(organization).orderBy(organization.name);
}

async function nameTaken(name: string, exceptId?: string): Promise<boolean> {
  const rows = await db.select({ id: organization.id }).from(organization).where(eq(organization.name, name));
  return rows.some((r) => r.id !== exceptId);
}

export async function createOrganization(actor: Actor, input: CreateOrganizationInput, ip: string): Promise<{ id: string }> {
  if (await nameTaken(input.name)) throw new DomainError("invalid", "Some fields need attention.", { name: ["An organization with this name exists."] });
  const id = randomUUID();
  await db.transaction(async (tx) => {
    await tx.insert(organization).values({ id, name: input.name, kind: input.kind, seats: input.seats });
    await audit(
      { actor, organizationId: id, action: "organization.create", targetType: "organization", targetId: id, ip, details: { name: input.name, kind: input.kind, seats: input.seats } },
      tx,
    );
  });
  return { id };
}

export async function renameOrganization(actor: Actor, id: string, name: string, ip: string): Promise<void> {
  const [current] = await db.select({ name: organization.name }).from(organization).where(eq(organization.id, id));
  if (!current) throw new DomainError("not-found", "No such organization.");
  if (current.name === name) throw new DomainError("invalid", "Some fields need attention.", { name: ["That is already its name."] });
  if (await nameTaken(name, id)) throw new DomainError("invalid", "Some fields need attention.", { name: ["An organization with this name exists."] });
  await db.transaction(async (tx) => {
    await tx.update(organization).set({ name }).where(eq(organization.id, id));
    await audit({ actor, organizationId: id, action: "organization.rename", targetType: "organization", targetId: id, ip, details: { from: current.name, to: name } }, tx);
  });
}
