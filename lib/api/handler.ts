import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { z, ZodError } from "zod";
import { currentActor } from "@/lib/auth/session";
import { authorize, type Action, type Actor } from "@/lib/auth/policy";
import { AppError, ValidationError } from "@/lib/errors";

type Ctx<P> = { req: NextRequest; actor: Actor | null; params: P };

/**
 * Wraps a route handler: authorizes the caller for `action` before anything else runs ("public" for
 * the few routes anyone may call), and turns thrown errors into one JSON shape with the right status.
 */
export function route<P = Record<string, string>>(
  action: Action | "public",
  fn: (ctx: Ctx<P>) => Promise<unknown>,
) {
  return async (req: NextRequest, context: { params: Promise<P> }) => {
    try {
      const actor = action === "public" ? await currentActor().catch(() => null) : await currentActor();
      if (action !== "public") authorize(actor, action);
      const result = await fn({ req, actor, params: await context.params });
      return result instanceof Response ? result : NextResponse.json(result ?? { ok: true });
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export function errorResponse(error: unknown): NextResponse {
  if (error instanceof ZodError) return errorResponse(fromZod(error));
  if (error instanceof AppError) {
    const headers: Record<string, string> = {};
    const retry = error.details?.retryAfterSeconds;
    if (typeof retry === "number") headers["retry-after"] = String(retry);
    return NextResponse.json({ error: { code: error.code, message: error.message, ...error.details } }, { status: error.status, headers });
  }
  console.error(error);
  return NextResponse.json({ error: { code: "internal", message: "Something went wrong on the server." } }, { status: 500 });
}

export function fromZod(error: ZodError): ValidationError {
  const fields: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_";
    (fields[key] ??= []).push(issue.message);
  }
  const first = error.issues[0];
  const where = first?.path.length ? `${first.path.join(".")}: ` : "";
  return new ValidationError(`Please correct the input. ${where}${first?.message ?? ""}`.trim(), fields);
}

/** Parses a JSON body with a zod schema; malformed JSON is a 400 like any other bad input. */
export async function readJson<T extends z.ZodType>(req: NextRequest, schema: T): Promise<z.infer<T>> {
  let body: unknown;
  try {
    body = await req.json();
  } catch {
    throw new ValidationError("The request body is not valid JSON.");
  }
  return schema.parse(body);
}

export function readQuery<T extends z.ZodType>(req: NextRequest, schema: T): z.infer<T> {
  const raw: Record<string, string> = {};
  req.nextUrl.searchParams.forEach((value, key) => {
    if (value !== "") raw[key] = value;
  });
  return schema.parse(raw);
}
