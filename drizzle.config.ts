import { defineConfig } from "drizzle-kit";

// Migrations are generated from db/schema and applied by db/migrate.ts (never `push`: it fails silently on MariaDB).
export default defineConfig({
  dialect: "mysql",
  schema: "./db/schema/index.ts",
  out: "./drizzle",
  dbCredentials: { url: process.env.DATABASE_URL ?? "mysql://cordarium@127.0.0.1:33061/cordarium" },
});
