import { hash, verify } from "@node-rs/argon2";
import { z } from "zod";

// argon2id with the OWASP-recommended minimum (19 MiB, 2 iterations, 1 lane).
const OPTIONS = { algorithm: 2 /* Argon2id */, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export const DEMO_PASSWORD = "cordarium-demo";

export const passwordSchema = z
  .string()
  .min(10, "Use at least 10 characters.")
  .max(200, "Use at most 200 characters.");

export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS);
}

export async function verifyPassword(storedHash: string | null, password: string): Promise<boolean> {
  if (!storedHash) return false;
  try {
    return await verify(storedHash, password);
  } catch {
    return false;
  }
}
