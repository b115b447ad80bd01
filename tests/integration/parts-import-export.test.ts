import { beforeAll, describe, expect, it } from "vitest";
import { Client, signedIn, uniqueEmail } from "../support/http";
import { withTestDb } from "../support/db";
import { signUp } from "../support/mail";

let owner: Client;
let other: Client;
const anonymous = new Client();
const tag = Date.now().toString(36);

type Row = { line: number; ok: boolean; name: string | null; errors: { line: number; column?: string; message: string }[] };
type ImportJson = { rows: Row[]; accepted: number; rejected: number; headerErrors: { message: string }[]; created?: number; ids?: string[] };

const HEADER = "name,provenance,provenanceNote,visibility,costEur,material,thicknessM [mm],widthM [mm],lengthM [mm]";
const good = (n: number) => `Imported strap ${n} ${tag},measured,bench calipers,shared,1.5,copper-pure,0.07,25,${60 + n}`;

async function countLike(pattern: string): Promise<number> {
  return withTestDb(async (conn) => {
    const [rows] = await conn.query("SELECT COUNT(*) AS n FROM part WHERE name LIKE ?", [pattern]);
    return Number((rows as { n: number }[])[0]?.n ?? 0);
  });
}

beforeAll(async () => {
  owner = await signedIn("maker@sinkwise.test");
  other = new Client();
  await signUp(other, { email: uniqueEmail("import-other"), password: "long enough pw", displayName: "Import Other" });
});

describe("CSV import: preview, then all-or-nothing", () => {
  const mixed = [
    HEADER,
    good(1),
    `Bad unit strap ${tag},measured,,shared,,copper-pure,3 W,25,60`,
    good(2),
    `Missing material strap ${tag},estimate,,private,,,0.07,25,60`,
    `Negative strap ${tag},estimate,,private,,copper-pure,0.07,-25,60`,
  ].join("\n");

  it("previews which rows would be created and which are rejected, by line and column", async () => {
    const r = await owner.post("/api/v1/parts/import", { kind: "spreader", csv: mixed, mode: "preview" });
    expect(r.status).toBe(200);
    const body = r.body as unknown as ImportJson;
    expect(body.accepted).toBe(2);
    expect(body.rejected).toBe(3);
    expect(body.rows.map((row) => [row.line, row.ok])).toEqual([[2, true], [3, false], [4, true], [5, false], [6, false]]);
    const bad = body.rows.find((row) => row.line === 3);
    expect(bad?.errors[0]?.column).toBe("thicknessM [mm]");
    expect(bad?.errors[0]?.message).toMatch(/expected a length/);
    expect(body.rows.find((row) => row.line === 5)?.errors[0]?.column).toBe("material");
    expect(body.rows.find((row) => row.line === 6)?.errors[0]?.message).toMatch(/greater than 0/);
    expect(await countLike(`%strap % ${tag}`)).toBe(0);
  });

  it("commits nothing while any row is bad, and says which lines", async () => {
    const r = await owner.post("/api/v1/parts/import", { kind: "spreader", csv: mixed, mode: "commit" });
    expect(r.status).toBe(422);
    expect(r.body.error?.code).toBe("unprocessable:import");
    expect(r.body.error?.message).toMatch(/line 3, thicknessM \[mm\]/);
    expect(r.body.error?.path).toBe("csv");
    expect(await countLike(`%strap % ${tag}`)).toBe(0);
  });

  it("commits every good row in one go, as the caller's parts", async () => {
    const csv = [HEADER, good(1), good(2), good(3)].join("\r\n");
    const r = await owner.post("/api/v1/parts/import", { kind: "spreader", csv, mode: "commit" });
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    expect((r.body as unknown as ImportJson).created).toBe(3);
    const id = (r.body as unknown as ImportJson).ids?.[0];
    const part = await owner.get(`/api/v1/parts/${id}`);
    const p = part.body.part as { specs: { thicknessM: number }; owner: { displayName: string }; visibility: string; costEur: number };
    expect(p.specs.thicknessM).toBeCloseTo(0.00007, 12);
    expect(p.visibility).toBe("shared");
    expect(p.costEur).toBe(1.5);
    expect(await countLike(`Imported strap % ${tag}`)).toBe(3);
  });

  it("refuses wrong headers, naming the column, and rows of another kind", async () => {
    const wrong = await owner.post("/api/v1/parts/import", { kind: "spreader", csv: `name,provenance,colour\nX ${tag},estimate,red`, mode: "preview" });
    expect(wrong.status).toBe(200);
    expect((wrong.body as unknown as ImportJson).headerErrors[0]?.message).toMatch(/unknown column "colour"/);
    const commit = await owner.post("/api/v1/parts/import", { kind: "spreader", csv: `name,provenance,colour\nX ${tag},estimate,red`, mode: "commit" });
    expect(commit.status).toBe(422);
    expect(commit.body.error?.message).toMatch(/header/);
    // A cell file imported as spreaders: its columns do not belong to a spreader.
    const cells = await owner.post("/api/v1/parts/import", { kind: "spreader", csv: `name,provenance,capacityCoulomb [mAh]\nCell ${tag},estimate,3000`, mode: "commit" });
    expect(cells.status).toBe(422);
    expect(cells.body.error?.message).toMatch(/capacityCoulomb/);
    const noKind = await owner.post("/api/v1/parts/import", { csv: HEADER, mode: "preview" });
    expect(noKind.status).toBe(400);
    expect(noKind.body.error?.path).toBe("kind");
  });

  it("refuses an anonymous import", async () => {
    expect((await anonymous.post("/api/v1/parts/import", { kind: "spreader", csv: HEADER })).status).toBe(401);
  });
});

describe("CSV export: what the table's filter shows", () => {
  it("exports one kind with the filter applied, readable back by the import", async () => {
    const res = await owner.fetchRaw("GET", `/api/v1/parts/export?kind=spreader&q=${encodeURIComponent(`Imported strap`)}&owner=mine&sort=name`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/text\/csv/);
    expect(res.headers.get("content-disposition")).toMatch(/attachment; filename="sinkwise-spreader-parts.csv"/);
    const text = await res.text();
    const lines = text.trim().split(/\r?\n/);
    expect(lines[0]).toBe(HEADER);
    const mine = lines.filter((l) => l.includes(tag));
    expect(mine.length).toBe(3);
    expect(mine[0]).toContain("0.07");
    // Round trip: the exported rows preview as good rows of the same kind.
    const preview = await owner.post("/api/v1/parts/import", { kind: "spreader", csv: [lines[0], ...mine].join("\n"), mode: "preview" });
    expect((preview.body as unknown as ImportJson).accepted).toBe(3);
  });

  it("shows other users only what they may see; refuses an export without a kind", async () => {
    const res = await other.fetchRaw("GET", `/api/v1/parts/export?kind=spreader&q=${encodeURIComponent(tag)}`);
    const text = await res.text();
    expect(text.split(/\r?\n/).filter((l) => l.includes(tag)).length).toBe(3);
    const anon = await anonymous.fetchRaw("GET", `/api/v1/parts/export?kind=spreader&q=${encodeURIComponent(tag)}`);
    expect((await anon.text()).includes(tag)).toBe(false);
    const noKind = await owner.get("/api/v1/parts/export");
    expect(noKind.status).toBe(400);
    expect(noKind.body.error?.path).toBe("kind");
  });
});
