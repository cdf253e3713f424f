import "server-only";
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { env } from "@/lib/env";
import * as schema from "./schema";

/** One pool per process, kept across hot reloads in development. */
const globalForDb = globalThis as unknown as { riserPool?: mysql.Pool };

export const pool =
  globalForDb.riserPool ??
  mysql.createPool({
    uri: env.DATABASE_URL,
    connectionLimit: env.DATABASE_POOL_SIZE,
    waitForConnections: true,
    connectTimeout: 10_000,
    timezone: "Z",
    dateStrings: false,
  });
if (process.env.NODE_ENV !== "production") globalForDb.riserPool = pool;

export const db = drizzle(pool, { schema, mode: "default" });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
