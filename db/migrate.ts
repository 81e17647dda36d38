// Applies the generated migrations in drizzle/ (idempotent). Run by the start and test scripts.
import { drizzle } from "drizzle-orm/mysql2";
import { migrate } from "drizzle-orm/mysql2/migrator";
import mysql from "mysql2/promise";

const url = process.env.DATABASE_URL;
if (!url) {
  console.error("DATABASE_URL is not set");
  process.exit(1);
}

const connection = await mysql.createConnection({ uri: url, timezone: "Z", multipleStatements: false });
try {
  await migrate(drizzle(connection), { migrationsFolder: new URL("../drizzle", import.meta.url).pathname });
  console.log("migrations applied");
} finally {
  await connection.end();
}
