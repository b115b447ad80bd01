// Direct access to the test database, for arranging states an API cannot reach quickly
// (an expired token). Reads the same environment as the app.
import mysql from "mysql2/promise";

export async function withTestDb<T>(fn: (conn: mysql.Connection) => Promise<T>): Promise<T> {
  const conn = await mysql.createConnection({
    host: process.env.DATABASE_HOST ?? "127.0.0.1",
    port: Number(process.env.DATABASE_PORT ?? 3307),
    user: process.env.DATABASE_USER,
    password: process.env.DATABASE_PASSWORD,
    database: process.env.DATABASE_NAME,
  });
  try {
    return await fn(conn);
  } finally {
    await conn.end();
  }
}
