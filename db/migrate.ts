// Applies the committed migrations in db/migrations: `npm run db:migrate`.
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
  await migrate(drizzle(connection), { migrationsFolder: new URL("./migrations", import.meta.url).pathname });
  console.log("[db] migrations applied");
} finally {
  await connection.end();
}
