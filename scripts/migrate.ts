// Applies the committed migrations in db/migrations, then syncs the content catalog (modules,
// lessons, paths, code cards, question versions) from content/: `npm run db:migrate`. Every instance
// runs this at deploy and npm start / npm test run it at start; demo data is separate (scripts/seed/seed.ts).
import { drizzle } from "drizzle-orm/mysql2";
import { migrate } from "drizzle-orm/mysql2/migrator";
import mysql from "mysql2/promise";

const url = process.env.DATABASE_URL;
if (!url) {
  console.error("DATABASE_URL is not set (the scripts in scripts/ set it; see README).");
  process.exit(1);
}
const connection = await mysql.createConnection({ uri: url, multipleStatements: true });
try {
  await migrate(drizzle(connection), { migrationsFolder: new URL("../db/migrations", import.meta.url).pathname });
  console.log("[db] migrations applied");
} finally {
  await connection.end();
}

// The catalog sync needs the app's environment (lib/env) and server modules: loaded only now.
const { pool } = await import("@/db/client");
try {
  await import("@/lib/catalog");
  const { syncCatalog } = await import("@/lib/catalog");
  console.log(`[db] catalog synced: ${JSON.stringify(await syncCatalog())}`);
} finally {
  await pool.end();
}
