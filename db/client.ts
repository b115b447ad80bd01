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
      connectTimeout: 5_000,
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

/** True when the error means MariaDB is not reachable (rather than a bad query). */
export function isDatabaseDown(error: unknown): boolean {
  const code = mysqlErrorCode(error);
  return (
    code === "ECONNREFUSED" ||
    code === "PROTOCOL_CONNECTION_LOST" ||
    code === "ETIMEDOUT" ||
    code === "ENOTFOUND" ||
    code === "ER_CON_COUNT_ERROR"
  );
}

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
