// GET, POST /api/auth/*: next-auth's sign-in, callback, session, CSRF and sign-out endpoints.
import NextAuth from "next-auth";
import type { NextRequest } from "next/server";
import { authOptions } from "@/lib/auth/options";

type Ctx = { params: Promise<{ nextauth: string[] }> };

// Options are built per request so that configuration is read at run time, not at build time.
const handle = (req: NextRequest, ctx: Ctx) => NextAuth(req, ctx, authOptions());

export { handle as GET, handle as POST };
