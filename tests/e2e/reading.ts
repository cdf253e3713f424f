/** Reading-time fixtures for browser tests (see tests/helpers/progress.ts for the integration ones). */
import { randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import mysql from "mysql2/promise";
import { DEMO_PASSWORD } from "../../db/demo";

/**
 * A throw-away learner in the demo contractor, and the seat-time fixture: the server's own
 * first-open stamps of that person moved back in time (never anything the client can send).
 */
export async function throwAwayLearner(): Promise<string> {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    const email = `e2e-reader-${Date.now().toString(36)}-${randomUUID().slice(0, 6)}@test.example`;
    const id = randomUUID();
    const [rows] = await conn.query("select organization_id from user where email = 'rafaela@quillmoor.example'");
    const org = (rows as { organization_id: string }[])[0]!.organization_id;
    await conn.query("insert into user (id, name, email, email_verified, role, organization_id, created_at, updated_at) values (?, 'Test Reader', ?, 1, 'learner', ?, now(), now())", [id, email, org]);
    await conn.query("insert into account (id, account_id, provider_id, user_id, password, created_at, updated_at) values (?, ?, 'credential', ?, ?, now(), now())", [randomUUID(), id, id, await hashPassword(DEMO_PASSWORD)]);
    return email;
  } finally {
    await conn.end();
  }
}

export async function backdateOpens(email: string) {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    await conn.query("update lesson_open o join user u on u.id = o.user_id set o.first_opened_at = o.first_opened_at - interval 1 day where u.email = ? and u.email like '%@test.example'", [email]);
  } finally {
    await conn.end();
  }
}

