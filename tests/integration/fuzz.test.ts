// Fuzz: at least 1,000 generated requests per write route (every POST/PUT/PATCH/DELETE under
// app/api), each invalid by construction: wrong types, non-finite and huge numbers, unicode
// with lone surrogates, deep nesting, oversize bodies, wrong content types, malformed JSON,
// and bad percent-encoding in path segments. None may answer 5xx, and no table gains or
// loses a row. The routes and a valid body for each come from the access matrix's rows.
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { makeWorld, type World } from "../support/access-world";
import { withTestDb } from "../support/db";
import { type Client } from "../support/http";
import { routeHandlers } from "../support/routes";
import { MATRIX } from "./access/matrix";

const RUNS = Number(process.env.FUZZ_RUNS ?? 1000);
const PARALLEL = 6;
const SEED = Number(process.env.FUZZ_SEED ?? 20261202);

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
/** A payload as sent: the raw body text, its content type and the path. */
type Payload = { path: string; body: string; type: string | null };

/** Stands for "the connection closed while an oversize body was still being sent". */
const CLOSED_EARLY = 0;
const NON_FINITE = "\u0000NONFINITE\u0000";
const BAD_SEGMENTS = ["%ff", "%", "%E0%A4%A", "%c0%af", "%ED%A0%80", "..%2f..%2fetc", "%00", "%2e%2e", "%uD800", "%%", "a%2Fb", "%F0%9F%98"];

const weirdString = fc.oneof(
  fc.string({ unit: "binary", maxLength: 40 }),
  fc.string({ unit: "grapheme", maxLength: 40 }),
  fc.constantFrom("\uD800", "a\uDC00b", "\uDBFF\uDBFF", "\u202Eevil", "\u0000", "'; DROP TABLE part; --", "<script>alert(1)</script>", "=cmd|' /C calc'!A0"),
  fc.integer({ min: 1000, max: 200_000 }).map((n) => "x".repeat(n)),
);
const hugeNumber = fc.constantFrom(1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, 5e-324, -0);
const deep = fc.integer({ min: 50, max: 1000 }).map((n) => {
  let v: Json = 1;
  for (let i = 0; i < n; i++) v = i % 2 ? [v] : { a: v };
  return v;
});
/** A value of another kind than a string or a number. */
// Never null: an optional field may take null for "not given", which is valid.
const notScalar: fc.Arbitrary<Json> = fc.oneof(fc.boolean(), fc.array(fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json>, { maxLength: 4 }), fc.dictionary(weirdString, fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json>, { maxKeys: 3 }), deep);
/** A value of another kind than an object or an array. */
const notContainer: fc.Arbitrary<Json> = fc.oneof(weirdString, fc.boolean(), hugeNumber, fc.constant(NON_FINITE));

type Leaf = { path: (string | number)[]; value: Json };
function leaves(value: Json, path: (string | number)[] = []): Leaf[] {
  if (Array.isArray(value)) return [{ path, value }, ...value.flatMap((v, i) => leaves(v, [...path, i]))];
  if (value && typeof value === "object") return [{ path, value }, ...Object.entries(value).flatMap(([k, v]) => leaves(v, [...path, k]))];
  return [{ path, value }];
}
function setAt(value: Json, path: (string | number)[], next: Json): Json {
  if (path.length === 0) return next;
  const [head, ...rest] = path;
  const copy: Json = Array.isArray(value) ? [...value] : { ...(value as Record<string, Json>) };
  (copy as Record<string | number, Json>)[head!] = setAt((value as Record<string | number, Json>)[head!] ?? null, rest, next);
  return copy;
}
function serialise(value: Json): string {
  return JSON.stringify(value).replaceAll(`"${NON_FINITE}"`, "1e999");
}

/** The template with one value swapped for a value of the wrong kind (always invalid), and up to two strings made strange. */
function mutated(template: Json): fc.Arbitrary<string> {
  const all = leaves(template);
  return fc
    .record({
      wrong: fc.constantFrom(...all),
      wrongValue: fc.boolean(),
      strange: fc.array(fc.record({ at: fc.constantFrom(...all), value: fc.oneof(weirdString, fc.constant(NON_FINITE), hugeNumber) }), { maxLength: 2 }),
      a: notScalar,
      b: notContainer,
    })
    .map(({ wrong, strange, a, b }) => {
      let v = template;
      for (const s of strange) if (typeof s.at.value === "string" || typeof s.at.value === "number") v = setAt(v, s.at.path, s.value as Json);
      // Last, so the wrong kind is what the schema sees at that place. The top level is an object: wrong is never {}.
      const isContainer = wrong.value !== null && typeof wrong.value === "object";
      let replacement: Json = isContainer ? b : a;
      if (wrong.path.length === 0 && replacement !== null && typeof replacement === "object" && !Array.isArray(replacement)) replacement = [replacement];
      if (typeof wrong.value === "boolean" && typeof replacement === "boolean") replacement = String(replacement);
      return serialise(setAt(v, wrong.path, replacement));
    });
}

/** Text that is not a JSON object at all (a blank body reads as `{}`, so never blank). */
const notAnObject = fc.oneof(
  fc.string({ unit: "binary", minLength: 1, maxLength: 200 }),
  fc.constantFrom("{", "[", "{\"a\":", "NaN", "Infinity", "{\"a\":NaN}", "{\"a\":1e999", "\uFEFF{}x", "null", "[]", "\"{}\"", "true", "{'a':1}", "{\"__proto__\":{\"x\":1}"),
  fc.integer({ min: 100, max: 20_000 }).map((n) => "[".repeat(n) + "]".repeat(n)),
  fc.integer({ min: 100, max: 20_000 }).map((n) => "{\"a\":".repeat(n) + "1" + "}".repeat(n)),
).filter((text) => {
  if (text.trim() === "") return false;
  try {
    const v: unknown = JSON.parse(text);
    return !(v && typeof v === "object" && !Array.isArray(v));
  } catch {
    return true;
  }
});

const contentType = fc.oneof(
  { weight: 6, arbitrary: fc.constant("application/json") },
  { weight: 1, arbitrary: fc.constantFrom("text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=zz", "application/json; charset=latin1", "image/png") },
  { weight: 1, arbitrary: fc.constant(null) },
);

function pathFor(route: string, real: string, segment: string | null): string {
  if (segment === null || !route.includes("[")) return real;
  // Every dynamic segment gets the fuzzed one, so no real object is ever reached.
  return route.replace(/^\S+ /, "").replace(/\[[^\]]+\]/g, segment);
}
const segment = fc.oneof(
  fc.constantFrom(...BAD_SEGMENTS),
  fc.string({ unit: "binary", minLength: 1, maxLength: 30 }).map((s) => encodeURIComponent(s)),
  fc.stringMatching(/^[A-Za-z0-9_-]{1,40}$/),
  fc.integer({ min: 300, max: 6000 }).map((n) => "z".repeat(n)),
);

/** Row counts of every table but the migrations' and the rate limiter's own bookkeeping. */
async function rowCounts(): Promise<Record<string, number>> {
  return withTestDb(async (c) => {
    const [tables] = await c.query("SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name NOT IN ('__drizzle_migrations', 'rate_limit') ORDER BY table_name");
    const out: Record<string, number> = {};
    for (const { t } of tables as { t: string }[]) {
      const [rows] = await c.query(`SELECT COUNT(*) AS n FROM \`${t}\``);
      out[t] = Number((rows as { n: number }[])[0]?.n);
    }
    return out;
  });
}

async function sendAll(client: Client, method: string, payloads: Payload[]): Promise<{ statuses: Map<number, number>; fiveXX: string[]; accepted: string[] }> {
  const statuses = new Map<number, number>();
  const fiveXX: string[] = [];
  const accepted: string[] = [];
  let next = 0;
  const worker = async () => {
    while (next < payloads.length) {
      const p = payloads[next++]!;
      const headers: Record<string, string> = p.type ? { "content-type": p.type } : {};
      let status: number;
      let answer: unknown = null;
      try {
        const r = await client.send(method, p.path, p.body, headers);
        status = r.status;
        answer = r.body;
      } catch (e) {
        // A server may refuse an oversize body and close the connection before the client has
        // finished sending it (the client then sees the socket close, not the 413). Anything
        // else that breaks the connection is a failure.
        if (p.body.length <= 1_000_000) throw e;
        status = CLOSED_EARLY;
      }
      statuses.set(status, (statuses.get(status) ?? 0) + 1);
      // The live editor's preview answers 200 with the draft's problems (`valid: false`): a refusal in other words.
      const refusedInBody = (answer as { valid?: unknown; issues?: unknown } | null)?.valid === false && Array.isArray((answer as { issues?: unknown[] }).issues) && (answer as { issues: unknown[] }).issues.length > 0;
      if (status >= 200 && status < 300 && !refusedInBody) accepted.push(`${status} ${p.path.slice(0, 80)} ${p.type} ${p.body.slice(0, 300)}`);
      if (status >= 500) fiveXX.push(`${status} ${p.path.slice(0, 80)} ${p.type} ${p.body.slice(0, 120)} → ${JSON.stringify(answer).slice(0, 200)}`);
    }
  };
  await Promise.all(Array.from({ length: PARALLEL }, worker));
  return { statuses, fiveXX, accepted };
}

const handlers = routeHandlers();
const WRITES = MATRIX.filter((r) => !r.route.startsWith("GET ") && !r.route.startsWith("HEAD "));

/** A DELETE, or a route that reads no body, is fuzzed through its path only: a real id would be used up. */
function isPathOnly(row: (typeof WRITES)[number]): boolean {
  const source = handlers.find((h) => h.key === row.route)?.source ?? "";
  return row.route.startsWith("DELETE ") || !/readJson|readUpload|handleSolve|readBody|request\.(json|text|formData)/.test(source);
}

describe("fuzz: every write route", () => {
  let world: World;
  let before: Record<string, number>;
  // The real address of each route fuzzed through its body: made first (some make a fresh
  // object), so the row counts are taken after every fixture exists.
  const realPaths = new Map<string, string>();
  beforeAll(async () => {
    world = await makeWorld();
    for (const row of WRITES) if (!isPathOnly(row)) realPaths.set(row.route, await row.path(world));
    before = await rowCounts();
  }, 300_000);

  it("covers every write handler of app/api", () => {
    const writeHandlers = handlers.filter((h) => !["GET", "HEAD", "OPTIONS"].includes(h.method)).map((h) => h.key);
    expect(WRITES.map((r) => r.route).sort()).toEqual(writeHandlers.sort());
  });

  for (const row of WRITES) {
    it(`${row.route}: ${RUNS} payloads, no 5xx`, async () => {
      const method = row.route.split(" ")[0]!;
      const pathOnly = isPathOnly(row);
      const template = row.body?.(world);
      const json: Json = template instanceof FormData || template === undefined ? {} : (template as Json);
      const real = pathOnly ? (row.route.includes("[") ? "" : await row.path(world)) : (realPaths.get(row.route) ?? "");
      const body = pathOnly ? fc.oneof(notAnObject, fc.constant("{}")) : fc.oneof({ weight: 3, arbitrary: mutated(json) }, { weight: 1, arbitrary: notAnObject });
      const seg = pathOnly && row.route.includes("[") ? segment : fc.option(segment, { freq: 4 });
      const oversize = fc.constant("{\"a\":\"" + "x".repeat(1_100_000) + "\"}");
      const payload = fc
        .record({ body: fc.oneof({ weight: 200, arbitrary: body }, { weight: 1, arbitrary: oversize }), type: contentType, seg })
        .map(({ body: text, type, seg: s }): Payload => ({ path: pathFor(row.route, real, s), body: text, type }));
      const payloads = fc.sample(payload, { numRuns: RUNS, seed: SEED });
      // Routes that end the caller's session are called without one.
      const client = row.ownSession ? world.clients.anonymous : world.clients.owner;
      const { statuses, fiveXX, accepted } = await sendAll(client, method, payloads);
      console.log(`[fuzz] ${row.route}: ${payloads.length} payloads → ${[...statuses].sort(([a], [b]) => a - b).map(([s, n]) => `${n}×${s}`).join(", ")}`);
      expect(fiveXX.slice(0, 5)).toEqual([]);
      expect(payloads.length).toBeGreaterThanOrEqual(RUNS);
      // Nothing invalid succeeds (a redirect of an odd address to its normal form is not a success; the row counts below show nothing was written).
      expect(row.ownSession ? [] : accepted.slice(0, 3)).toEqual([]);
    }, 600_000);
  }

  it("wrote nothing: every table has as many rows as before", async () => {
    expect(await rowCounts()).toEqual(before);
  });
});
