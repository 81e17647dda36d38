import "server-only";
import { drizzle, type MySql2Database } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { config } from "@/lib/config";
import * as schema from "./schema";

export type Database = MySql2Database<typeof schema>;
export type Transaction = Parameters<Parameters<Database["transaction"]>[0]>[0];
/** Either the pool or an open transaction: data-access functions accept both. */
export type Executor = Database | Transaction;

type Held = { pool: mysql.Pool; db: Database };

// Cached on globalThis so that hot reload in development does not open a new pool each time.
const holder = globalThis as unknown as { __cordariumDb?: Held };

function open(): Held {
  const pool = mysql.createPool({
    uri: config().DATABASE_URL,
    connectionLimit: config().DATABASE_POOL_SIZE,
    timezone: "Z",
    dateStrings: false,
    supportBigNumbers: true,
  });
  return { pool, db: drizzle(pool, { schema, mode: "default" }) };
}

export function db(): Database {
  holder.__cordariumDb ??= open();
  return holder.__cordariumDb.db;
}

export function pool(): mysql.Pool {
  holder.__cordariumDb ??= open();
  return holder.__cordariumDb.pool;
}

export async function closeDb(): Promise<void> {
  const held = holder.__cordariumDb;
  holder.__cordariumDb = undefined;
  await held?.pool.end();
}
