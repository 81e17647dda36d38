import "server-only";
import { RateLimiterMySQL, RateLimiterRes } from "rate-limiter-flexible";
import { pool } from "@/db/client";
import { config } from "@/lib/config";
import { TooManyRequestsError } from "@/lib/errors";

// Failed sign-ins are counted per account and per network address in the database (so every app
// instance sees the same counts). Past the limit, further attempts wait out the block.
const WINDOW_SECONDS = 15 * 60;
const BLOCK_SECONDS = 15 * 60;

type Limiters = { account: RateLimiterMySQL; address: RateLimiterMySQL };
let limiters: Limiters | undefined;

function get(): Limiters {
  if (limiters) return limiters;
  const dbName = new URL(config().DATABASE_URL).pathname.replace(/^\//, "");
  // rate-limiter-flexible speaks mysql2's callback API: hand it the pool under the promise wrapper.
  const storeClient = (pool() as unknown as { pool: unknown }).pool;
  const common = { storeClient, storeType: "pool", dbName, tableName: "sign_in_limits", tableCreated: true };
  limiters = {
    account: new RateLimiterMySQL({
      ...common,
      keyPrefix: "account",
      points: config().SIGN_IN_MAX_FAILURES_PER_ACCOUNT,
      duration: WINDOW_SECONDS,
      blockDuration: BLOCK_SECONDS,
    }),
    address: new RateLimiterMySQL({
      ...common,
      keyPrefix: "address",
      points: config().SIGN_IN_MAX_FAILURES_PER_ADDRESS,
      duration: WINDOW_SECONDS,
      blockDuration: BLOCK_SECONDS,
    }),
  };
  return limiters;
}

const accountKey = (email: string) => email.trim().toLowerCase();

function refuse(res: RateLimiterRes): never {
  const seconds = Math.max(1, Math.ceil(res.msBeforeNext / 1000));
  const minutes = Math.ceil(seconds / 60);
  throw new TooManyRequestsError(
    `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}, or reset your password.`,
    seconds,
  );
}

/** Throws TooManyRequestsError while the account or the address is blocked. */
export async function assertSignInAllowed(email: string, address: string): Promise<void> {
  const { account, address: byAddress } = get();
  const [a, b] = await Promise.all([account.get(accountKey(email)), byAddress.get(address)]);
  for (const res of [a, b]) {
    if (res && res.remainingPoints <= 0 && res.msBeforeNext > 0) refuse(res);
  }
}

export async function recordFailedSignIn(email: string, address: string): Promise<void> {
  const { account, address: byAddress } = get();
  await Promise.allSettled([account.consume(accountKey(email)), byAddress.consume(address)]);
}

export async function recordSuccessfulSignIn(email: string): Promise<void> {
  await get().account.delete(accountKey(email));
}
