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

// Reset mails: a few per address an hour (a person retrying), more per client address.
const RESET_WINDOW_S = 60 * 60;
const RESET_PER_EMAIL = 3;
const RESET_PER_CLIENT = 20;

// Answer checks: a student trying values one after another could home in on a hidden value;
// a few dozen tries per question in ten minutes is plenty for honest work.
const ANSWER_WINDOW_S = 10 * 60;
const ANSWERS_PER_QUESTION = 20;

type Limiters = { account: RateLimiterMySQL; address: RateLimiterMySQL; resetEmail: RateLimiterMySQL; resetClient: RateLimiterMySQL; answer: RateLimiterMySQL };
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
      resetEmail: new RateLimiterMySQL({ ...common, keyPrefix: "reset_email", points: RESET_PER_EMAIL, duration: RESET_WINDOW_S, blockDuration: RESET_WINDOW_S }),
      resetClient: new RateLimiterMySQL({ ...common, keyPrefix: "reset_client", points: RESET_PER_CLIENT, duration: RESET_WINDOW_S, blockDuration: RESET_WINDOW_S }),
      answer: new RateLimiterMySQL({ ...common, keyPrefix: "answer_check", points: ANSWERS_PER_QUESTION, duration: ANSWER_WINDOW_S, blockDuration: ANSWER_WINDOW_S }),
    };
  }
  return holder.sinkwiseLimiters;
}

function tooMany(res: RateLimiterRes | null): ApiError {
  const minutes = Math.max(1, Math.ceil((res?.msBeforeNext ?? WINDOW_S * 1000) / 60_000));
  return new ApiError(
    "rate_limited:signin",
    `Too many failed sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}, or reset your password.`,
  );
}

/**
 * Takes one attempt from the account's and the address's allowance BEFORE the password is
 * checked: the database counts atomically, so however many guesses arrive at once, at most
 * the allowance of them is ever checked. Throws 429 when either allowance is used up.
 */
export async function consumeSignInAttempt(email: string, address: string): Promise<void> {
  const l = limiters();
  const results = await Promise.allSettled([l.account.consume(email), l.address.consume(address)]);
  for (const result of results) {
    if (result.status === "rejected") {
      if (result.reason instanceof RateLimiterRes) throw tooMany(result.reason);
      throw result.reason;
    }
  }
}

/**
 * After a right password the attempt is given back. Earlier failures stay counted for their
 * window: forgetting them here would hand fresh guesses to a burst still in flight.
 */
export async function signInSucceeded(email: string, address: string): Promise<void> {
  const l = limiters();
  await Promise.all([l.account.reward(email, 1), l.address.reward(address, 1)]);
}

/**
 * Takes one reset request from the address's and the client's hourly allowance. Keyed on
 * the address as typed, so the answer is the same whether or not an account uses it.
 */
export async function consumeResetRequest(email: string, client: string): Promise<void> {
  const l = limiters();
  const results = await Promise.allSettled([l.resetEmail.consume(email), l.resetClient.consume(client)]);
  for (const result of results) {
    if (result.status === "rejected") {
      if (result.reason instanceof RateLimiterRes) {
        const minutes = Math.max(1, Math.ceil(result.reason.msBeforeNext / 60_000));
        throw new ApiError("rate_limited:reset", `Too many reset requests. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`);
      }
      throw result.reason;
    }
  }
}

/**
 * Takes one check from the student's allowance for this question of this example BEFORE the
 * answer is compared: the database counts atomically, so a burst of guesses gets at most the
 * allowance checked. Throws 429 when it is used up.
 */
export async function consumeAnswerCheck(userId: string, exampleId: string, key: string): Promise<void> {
  try {
    await limiters().answer.consume(`${userId}:${exampleId}:${key}`);
  } catch (err) {
    if (err instanceof RateLimiterRes) {
      const minutes = Math.max(1, Math.ceil(err.msBeforeNext / 60_000));
      throw new ApiError("rate_limited:answer", `Too many answers checked for this value. Work it through again and try in ${minutes} minute${minutes === 1 ? "" : "s"}.`, "value");
    }
    throw err;
  }
}

/** How many answer checks a student has per question of an example in each ten minutes (for tests and the screen). */
export const ANSWER_CHECKS = { perQuestion: ANSWERS_PER_QUESTION, windowS: ANSWER_WINDOW_S } as const;
