// npm run db:backup / db:restore round trip: a restored copy has every table with the same
// rows (CHECKSUM TABLE equal), and restore refuses a database that is not empty.
import { execFile } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { promisify } from "node:util";
import { afterAll, describe, expect, it } from "vitest";
import { withTestDb } from "../support/db";

const run = promisify(execFile);
const dir = mkdtempSync(join(tmpdir(), "sinkwise-backup-"));
const copy = `${process.env.DATABASE_NAME ?? "sinkwise_test"}_restored`;

async function checksums(database: string): Promise<Record<string, string>> {
  return withTestDb(async (c) => {
    const [tables] = await c.query("SELECT table_name AS t FROM information_schema.tables WHERE table_schema = ? ORDER BY table_name", [database]);
    const out: Record<string, string> = {};
    for (const { t } of tables as { t: string }[]) {
      const [rows] = await c.query(`CHECKSUM TABLE \`${database}\`.\`${t}\` EXTENDED`);
      out[t] = String((rows as { Checksum: unknown }[])[0]?.Checksum);
    }
    return out;
  });
}

afterAll(async () => {
  await run("bash", ["scripts/db.sh", "drop-db", copy], { env: process.env });
  rmSync(dir, { recursive: true, force: true });
});

describe("backup and restore", () => {
  it("restores a backup into an empty database with every table's checksum equal", async () => {
    const source = process.env.DATABASE_NAME ?? "sinkwise_test";
    const file = join(dir, "one.sql.gz");
    await run("bash", ["scripts/db.sh", "drop-db", copy], { env: process.env });
    const before = await checksums(source);
    const backup = await run("npm", ["run", "--silent", "db:backup", "--", file], { env: process.env });
    expect(backup.stdout).toContain("[backup]");
    expect(existsSync(file)).toBe(true);
    // One file per run: the same name is never overwritten.
    await expect(run("npm", ["run", "--silent", "db:backup", "--", file], { env: process.env })).rejects.toThrow();
    await run("npm", ["run", "--silent", "db:restore", "--", file, copy], { env: process.env });
    const restored = await checksums(copy);
    expect(Object.keys(before).length).toBeGreaterThan(10);
    expect(restored).toEqual(before);
    // A second restore into the now non-empty copy is refused.
    await expect(run("npm", ["run", "--silent", "db:restore", "--", file, copy], { env: process.env })).rejects.toThrow(/empty database/);
  }, 120_000);
});
