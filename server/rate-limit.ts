import "server-only";
import { RateLimiterMySQL, RateLimiterRes } from "rate-limiter-flexible";
import { pool } from "@/db/client";
import { env } from "@/server/env";
import { ApiError } from "@/lib/http/api-error";

// Failed sign-ins are counted in MariaDB (table rate_limit, created by our migrations), so
// every app process sees the same counts.
const WINDOW_S = 15 * 60;
const PER_ACCOUNT = 5;
const PER_ADDRESS = 20;

type Limiters = { account: RateLimiterMySQL; address: RateLimiterMySQL };
const holder = globalThis as unknown as { sinkwiseLimiters?: Limiters };

function limiters(): Limiters {
  if (!holder.sinkwiseLimiters) {
    const common = {
      storeClient: pool().pool,
      storeType: "pool",
      dbName: env().DATABASE_NAME,
      tableName: "rate_limit",
      tableCreated: true,
      duration: WINDOW_S,
      blockDuration: WINDOW_S,
    };
    holder.sinkwiseLimiters = {
      account: new RateLimiterMySQL({ ...common, keyPrefix: "signin_account", points: PER_ACCOUNT }),
      address: new RateLimiterMySQL({ ...common, keyPrefix: "signin_address", points: PER_ADDRESS }),
    };
  }
  return holder.sinkwiseLimiters;
}

export function clientAddress(request: Request): string {
  const forwarded = request.headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || request.headers.get("x-real-ip") || "unknown";
}

function tooMany(res: RateLimiterRes | null): ApiError {
  const minutes = Math.max(1, Math.ceil((res?.msBeforeNext ?? WINDOW_S * 1000) / 60_000));
  return new ApiError(
    "rate_limited:signin",
    `Too many failed sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}, or reset your password.`,
  );
}

/** Throws 429 when the account or the address has used up its failed attempts. */
export async function assertSignInAllowed(email: string, address: string): Promise<void> {
  const l = limiters();
  const [acct, addr] = await Promise.all([l.account.get(email), l.address.get(address)]);
  if (acct && acct.consumedPoints >= PER_ACCOUNT) throw tooMany(acct);
  if (addr && addr.consumedPoints >= PER_ADDRESS) throw tooMany(addr);
}

export async function recordSignInFailure(email: string, address: string): Promise<void> {
  const l = limiters();
  await Promise.all([
    l.account.consume(email).catch((e: unknown) => ignoreLimit(e)),
    l.address.consume(address).catch((e: unknown) => ignoreLimit(e)),
  ]);
}

export async function clearSignInFailures(email: string): Promise<void> {
  await limiters().account.delete(email);
}

function ignoreLimit(e: unknown): void {
  // consume() rejects with a RateLimiterRes once the limit is reached: that is expected.
  if (!(e instanceof RateLimiterRes)) throw e;
}
