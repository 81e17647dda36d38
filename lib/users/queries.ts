import "server-only";
import { and, asc, count, desc, eq, isNotNull, isNull, like, or, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { escapeLike } from "@/lib/db-like";
import type { UserListQuery } from "./schemas";

export const publicUserColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  disabledAt: users.disabledAt,
  lastSignInAt: users.lastSignInAt,
  createdAt: users.createdAt,
  version: users.version,
};

export type UserRow = {
  id: number;
  email: string;
  name: string;
  role: (typeof users.$inferSelect)["role"];
  disabledAt: Date | null;
  lastSignInAt: Date | null;
  createdAt: Date;
  version: number;
};


export async function listUsers(actor: Actor | null, query: UserListQuery) {
  authorize(actor, "user.manage");
  const where: SQL[] = [];
  if (query.q) {
    const pattern = `%${escapeLike(query.q)}%`;
    where.push(or(like(users.name, pattern), like(users.email, pattern))!);
  }
  if (query.role) where.push(eq(users.role, query.role));
  if (query.status === "active") where.push(isNull(users.disabledAt));
  if (query.status === "disabled") where.push(isNotNull(users.disabledAt));
  const filter = where.length ? and(...where) : undefined;
  const column = users[query.sort];
  const order = query.dir === "asc" ? asc(column) : desc(column);

  const [rows, [{ total }]] = await Promise.all([
    db()
      .select(publicUserColumns)
      .from(users)
      .where(filter)
      .orderBy(order, asc(users.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db().select({ total: count() }).from(users).where(filter),
  ]);
  return { users: rows as UserRow[], total, page: query.page, pageSize: query.pageSize };
}

export async function getUserByEmail(email: string) {
  const [row] = await db().select().from(users).where(eq(users.email, email.trim().toLowerCase())).limit(1);
  return row ?? null;
}

export async function getUserById(id: number) {
  const [row] = await db().select().from(users).where(eq(users.id, id)).limit(1);
  return row ?? null;
}
