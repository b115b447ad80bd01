import "server-only";
import { drizzle, type MySql2Database } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { env } from "@/server/env";
import * as schema from "./schema";

export type Db = MySql2Database<typeof schema>;

// One pool per process, kept on globalThis so hot reload does not open a new one each time.
const holder = globalThis as unknown as { sinkwisePool?: mysql.Pool; sinkwiseDb?: Db };

export function pool(): mysql.Pool {
  if (!holder.sinkwisePool) {
    const e = env();
    holder.sinkwisePool = mysql.createPool({
      host: e.DATABASE_HOST,
      port: e.DATABASE_PORT,
      user: e.DATABASE_USER,
      password: e.DATABASE_PASSWORD,
      database: e.DATABASE_NAME,
      connectionLimit: 10,
      queueLimit: 200,
      // A refused connection fails at once; an unreachable host must not hold a request past 2 s.
      connectTimeout: 1_500,
      dateStrings: false,
      timezone: "Z",
      enableKeepAlive: true,
    });
  }
  return holder.sinkwisePool;
}

export function db(): Db {
  holder.sinkwiseDb ??= drizzle(pool(), { schema, mode: "default" });
  return holder.sinkwiseDb;
}

/**
 * Something made from the client once per client, such as prepared statements (their SQL is
 * built once, not on every call); made again only for a new client.
 */
export function preparedOnce<T>(make: () => T): () => T {
  const made = new WeakMap<Db, T>();
  return () => {
    const client = db();
    let value = made.get(client);
    if (value === undefined) {
      value = make();
      made.set(client, value);
    }
    return value;
  };
}

/**
 * True when the error means MariaDB is not reachable or went away (rather than a bad query):
 * refused or reset connections, a server shutting down, a pool that is full, or any error the
 * driver marks fatal for its connection. Each of these is a 503, never a 500.
 */
export function isDatabaseDown(error: unknown): boolean {
  const code = mysqlErrorCode(error);
  if (code !== undefined && DOWN_CODES.has(code)) return true;
  for (let e: unknown = error, depth = 0; depth < 4 && e && typeof e === "object"; depth++) {
    if ((e as { fatal?: unknown }).fatal === true) return true;
    // mysql2 says this (without a code) when a query is sent on a connection that died.
    if (/closed state|Pool is closed|Connection lost/i.test(String((e as { message?: unknown }).message ?? ""))) return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

const DOWN_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "EPIPE",
  "ETIMEDOUT",
  "ENOTFOUND",
  "EHOSTUNREACH",
  "PROTOCOL_CONNECTION_LOST",
  "PROTOCOL_SEQUENCE_TIMEOUT",
  "ER_CON_COUNT_ERROR",
  "ER_SERVER_SHUTDOWN",
  "ER_CONNECTION_KILLED",
  "ER_QUERY_INTERRUPTED",
  "POOL_ENQUEUELIMIT",
]);

/** The driver's error code, looking through Drizzle's wrapper (which keeps it in `cause`). */
export function mysqlErrorCode(error: unknown): string | undefined {
  let e: unknown = error;
  for (let depth = 0; depth < 4 && e && typeof e === "object"; depth++) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === "string") return code;
    e = (e as { cause?: unknown }).cause;
  }
  return undefined;
}
