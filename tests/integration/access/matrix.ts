// THE role × route × method matrix: one row per exported handler of app/api/**/route.ts.
// A new route (or a new method on one) fails tests/integration/access-matrix.test.ts until
// it has a row here. Each row says how to call it (path, body) for the objects of
// tests/support/access-world.ts and the status every role must get, in this order:
//
//        anonymous  owner  maker  reviewer  instructor  student  admin
//
// "owner" is the maker who owns every object of the world; "maker" is a second maker;
// the reviewer is assigned to the owner's build (`world.build`) by a review; the student
// is a maker in the instructor's class once classes exist. Statuses are the whole rule:
// 401 not signed in, 403 seen but not allowed, 404 not told it exists.
import { pdfForm, type World } from "../../support/access-world";
import { GOOD_PARTS } from "../../unit/parts/fixtures";

export type Statuses = readonly [anonymous: number, owner: number, maker: number, reviewer: number, instructor: number, student: number, admin: number];

export type Row = {
  /** "METHOD /api/v1/…" with the folder names of app/api ([id] stays as it is). */
  route: string;
  /** The URL to call; may make a fresh object for cells that use it up. */
  path: (w: World) => string | Promise<string>;
  /** A JSON body, or FormData for uploads. */
  body?: (w: World) => unknown;
  /** Call it from a second session of the role (the call ends or replaces the session it uses). */
  ownSession?: boolean;
  expect: Statuses;
};

const same = (status: number): Statuses => [status, status, status, status, status, status, status];

const NETWORK = {
  ambientC: 25,
  nodes: [{ id: "junction", heatCapacityJPerK: 0.05 }, { id: "case", heatCapacityJPerK: 40 }],
  links: [
    { from: "junction", to: "case", type: "resistance", kelvinPerWatt: 2.5 },
    { from: "case", to: "ambient", type: "convection", areaM2: 0.02, coefficientWPerM2K: 8 },
  ],
  sources: [{ node: "junction", watts: 7 }],
};

let counter = 0;
const unique = (tag: string) => `${tag}-${Date.now().toString(36)}-${(counter++).toString(36)}@example.org`;

/** A private bench run of the owner's: one reading and the sink's mass, so it fits. */
const BENCH_RUN = { title: "Matrix run", conditions: { ambientC: 25, heatW: "7 W", massKg: "100 g", material: "aluminium-6063-t5" }, readings: [{ tS: "20 min", tempC: 60 }] };
const benchRuns = new WeakMap<World, Promise<string>>();
async function freshBenchRun(w: World): Promise<string> {
  const r = await w.clients.owner.post("/api/v1/bench/runs", BENCH_RUN);
  if (r.status !== 201) throw new Error(`bench run: ${r.status} ${JSON.stringify(r.body)}`);
  return (r.body.run as { id: string }).id;
}
function benchRun(w: World): Promise<string> {
  let id = benchRuns.get(w);
  if (!id) benchRuns.set(w, (id = freshBenchRun(w)));
  return id;
}

/** A private warm-up of the owner's build (world.build) at two places the model has, for its calibration. */
const buildRuns = new WeakMap<World, Promise<string>>();
function buildRun(w: World): Promise<string> {
  let id = buildRuns.get(w);
  if (!id) {
    id = (async () => {
      const readings = [5, 10, 20, 30].flatMap((min, i) => [{ tS: `${min} min`, tempC: 28 + 4 * i, place: "heatsink" }, { tS: `${min} min`, tempC: 24 + 2 * i, place: "housing wall" }]);
      const r = await w.clients.owner.post("/api/v1/bench/runs", { title: "Matrix lamp warm-up", powered: { kind: "build", buildId: w.build }, conditions: { ambientC: 22, volts: "7.4 V", amps: "0.9 A" }, readings });
      if (r.status !== 201) throw new Error(`build run: ${r.status} ${JSON.stringify(r.body)}`);
      return (r.body.run as { id: string }).id;
    })();
    buildRuns.set(w, id);
  }
  return id;
}

export const MATRIX: Row[] = [
  // —— accounts
  { route: "POST /api/v1/auth/signup", path: () => "/api/v1/auth/signup", body: () => ({ email: unique("matrix-signup"), password: "long enough pw", displayName: "Matrix" }), ownSession: true, expect: same(202) },
  { route: "POST /api/v1/auth/signup-confirm", path: () => "/api/v1/auth/signup-confirm", body: () => ({ token: "not-a-real-token-000000000000000" }), ownSession: true, expect: same(400) },
  { route: "POST /api/v1/auth/signin", path: () => "/api/v1/auth/signin", body: () => ({ email: unique("matrix-nobody"), password: "wrong password" }), expect: same(401) },
  { route: "POST /api/v1/auth/signout", path: () => "/api/v1/auth/signout", body: () => ({}), ownSession: true, expect: same(200) },
  { route: "POST /api/v1/auth/reset-request", path: () => "/api/v1/auth/reset-request", body: () => ({ email: unique("matrix-reset") }), expect: same(200) },
  { route: "POST /api/v1/auth/reset-confirm", path: () => "/api/v1/auth/reset-confirm", body: () => ({ token: "not-a-real-token-000000000000000", password: "long enough pw" }), expect: same(400) },
  { route: "GET /api/v1/me", path: () => "/api/v1/me", expect: [401, 200, 200, 200, 200, 200, 200] },
  { route: "GET /api/v1/admin/users", path: () => "/api/v1/admin/users", expect: [401, 403, 403, 403, 403, 403, 200] },
  { route: "PATCH /api/v1/admin/users/[id]", path: async (w) => `/api/v1/admin/users/${await w.fresh.user()}`, body: () => ({ role: "reviewer" }), expect: [401, 403, 403, 403, 403, 403, 200] },
  { route: "GET /api/v1/health", path: () => "/api/v1/health", expect: same(200) },
  { route: "GET /api/v1/ping", path: () => "/api/v1/ping", expect: same(200) },
  { route: "GET /api/v1/notifications", path: () => "/api/v1/notifications", expect: [401, 200, 200, 200, 200, 200, 200] },
  { route: "POST /api/v1/notifications/read", path: () => "/api/v1/notifications/read", body: () => ({}), expect: [401, 200, 200, 200, 200, 200, 200] },

  // —— stateless engine
  { route: "POST /api/v1/check", path: () => "/api/v1/check", body: () => ({ heatWatts: "7 W", sink: { declaredKPerW: "4 K/W" }, ambientC: "25 °C" }), expect: same(200) },
  { route: "POST /api/v1/solve/steady", path: () => "/api/v1/solve/steady", body: () => NETWORK, expect: same(200) },
  { route: "POST /api/v1/bench/fit", path: () => "/api/v1/bench/fit", body: () => ({ ambientC: 25, heatW: "7 W", readings: [{ tS: "20 min", tempC: 60 }], massKg: "100 g", material: "aluminium-6063-t5" }), expect: same(200) },
  { route: "POST /api/v1/solve/transient", path: () => "/api/v1/solve/transient", body: () => ({ network: NETWORK, durationS: 600, stepS: 10 }), expect: same(200) },

  // —— bench runs (the owner's are private: nobody else, admins included, is told they exist)
  { route: "GET /api/v1/bench/runs", path: () => "/api/v1/bench/runs", expect: [401, 200, 200, 200, 200, 200, 200] },
  { route: "POST /api/v1/bench/runs", path: () => "/api/v1/bench/runs", body: () => BENCH_RUN, expect: [401, 201, 201, 201, 201, 201, 201] },
  { route: "GET /api/v1/bench/runs/[id]", path: async (w) => `/api/v1/bench/runs/${await benchRun(w)}`, expect: [401, 200, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/bench/runs/[id]/part", path: async (w) => `/api/v1/bench/runs/${await freshBenchRun(w)}/part`, body: () => ({ name: "Matrix sink" }), expect: [401, 201, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/bench/runs/[id]/calibration", path: async (w) => `/api/v1/bench/runs/${await buildRun(w)}/calibration`, body: () => ({ save: false }), expect: [401, 200, 404, 404, 404, 404, 404] },

  // —— parts (the owner's are private)
  { route: "GET /api/v1/parts", path: () => "/api/v1/parts", expect: same(200) },
  { route: "POST /api/v1/parts", path: () => "/api/v1/parts", body: () => ({ ...GOOD_PARTS.spreader, name: "Matrix strap", visibility: "private" }), expect: [401, 201, 201, 201, 201, 201, 201] },
  { route: "GET /api/v1/parts/export", path: () => "/api/v1/parts/export?kind=emitter", expect: same(200) },
  { route: "POST /api/v1/parts/import", path: () => "/api/v1/parts/import", body: () => ({ kind: "interface", csv: "name\n", mode: "preview" }), expect: [401, 200, 200, 200, 200, 200, 200] },
  { route: "GET /api/v1/parts/[id]", path: (w) => `/api/v1/parts/${w.parts.emitter}`, expect: [404, 200, 404, 404, 404, 404, 200] },
  { route: "PATCH /api/v1/parts/[id]", path: (w) => `/api/v1/parts/${w.parts.emitter}`, body: () => ({ name: "Matrix emitter" }), expect: [401, 200, 404, 404, 404, 404, 200] },
  { route: "DELETE /api/v1/parts/[id]", path: async (w) => `/api/v1/parts/${await w.fresh.part()}`, expect: [401, 200, 404, 404, 404, 404, 200] },
  { route: "POST /api/v1/parts/[id]/duplicate", path: (w) => `/api/v1/parts/${w.parts.emitter}/duplicate`, body: () => ({}), expect: [401, 201, 404, 404, 404, 404, 201] },
  { route: "PATCH /api/v1/parts/[id]/verify", path: (w) => `/api/v1/parts/${w.parts.emitter}/verify`, body: () => ({ verified: false }), expect: [401, 403, 403, 403, 403, 403, 200] },
  { route: "GET /api/v1/parts/[id]/attachments", path: (w) => `/api/v1/parts/${w.parts.emitter}/attachments`, expect: [404, 200, 404, 404, 404, 404, 200] },
  { route: "POST /api/v1/parts/[id]/attachments", path: (w) => `/api/v1/parts/${w.parts.emitter}/attachments`, body: () => pdfForm(), expect: [401, 201, 404, 404, 404, 404, 201] },
  { route: "GET /api/v1/parts/[id]/attachments/[attachmentId]", path: (w) => `/api/v1/parts/${w.parts.emitter}/attachments/${w.attachment}`, expect: [404, 200, 404, 404, 404, 404, 200] },
  { route: "DELETE /api/v1/parts/[id]/attachments/[attachmentId]", path: async (w) => { const a = await w.fresh.attachment(); return `/api/v1/parts/${a.partId}/attachments/${a.id}`; }, expect: [401, 200, 404, 404, 404, 404, 200] },

  // —— builds (world.build is private, reviewed by the reviewer)
  { route: "GET /api/v1/builds", path: () => "/api/v1/builds", expect: [401, 200, 200, 200, 200, 200, 200] },
  { route: "POST /api/v1/builds", path: () => "/api/v1/builds", body: () => ({ title: "Matrix empty", design: { lightEngine: { count: 1 } } }), expect: [401, 201, 201, 201, 201, 201, 201] },
  { route: "POST /api/v1/builds/import", path: () => "/api/v1/builds/import", body: () => ({ format: "not a build file" }), expect: [401, 400, 400, 400, 400, 400, 400] },
  { route: "GET /api/v1/builds/[id]", path: (w) => `/api/v1/builds/${w.build}`, expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "PATCH /api/v1/builds/[id]", path: (w) => `/api/v1/builds/${w.build}`, body: () => ({ summary: "Checked by the matrix." }), expect: [401, 200, 404, 403, 404, 404, 403] },
  { route: "DELETE /api/v1/builds/[id]", path: async (w) => `/api/v1/builds/${await w.fresh.build()}`, expect: [401, 200, 404, 404, 404, 404, 403] },
  { route: "GET /api/v1/builds/[id]/export", path: (w) => `/api/v1/builds/${w.build}/export`, expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "POST /api/v1/builds/[id]/fork", path: (w) => `/api/v1/builds/${w.build}/fork`, body: () => ({}), expect: [401, 201, 404, 403, 404, 404, 201] },
  { route: "GET /api/v1/builds/[id]/members", path: (w) => `/api/v1/builds/${w.build}/members`, expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "POST /api/v1/builds/[id]/members", path: async (w) => `/api/v1/builds/${await w.fresh.build()}/members`, body: (w) => ({ email: w.people.student.email, canEdit: false }), expect: [401, 201, 404, 404, 404, 404, 403] },
  { route: "DELETE /api/v1/builds/[id]/members/[userId]", path: async (w) => { const m = await w.fresh.member(); return `/api/v1/builds/${m.buildId}/members/${m.userId}`; }, expect: [401, 200, 403, 404, 404, 404, 403] },
  { route: "GET /api/v1/builds/[id]/reviews", path: (w) => `/api/v1/builds/${w.build}/reviews`, expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "POST /api/v1/builds/[id]/reviews", path: async (w) => `/api/v1/builds/${await w.fresh.build()}/reviews`, body: (w) => ({ reviewerEmail: w.people.reviewer.email }), expect: [401, 201, 404, 404, 404, 404, 403] },
  { route: "GET /api/v1/builds/[id]/revisions", path: (w) => `/api/v1/builds/${w.build}/revisions`, expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "GET /api/v1/builds/[id]/revisions/[number]", path: (w) => `/api/v1/builds/${w.build}/revisions/1`, expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "GET /api/v1/builds/[id]/shares", path: (w) => `/api/v1/builds/${w.build}/shares`, expect: [401, 200, 404, 403, 404, 404, 403] },
  { route: "POST /api/v1/builds/[id]/shares", path: (w) => `/api/v1/builds/${w.build}/shares`, body: () => ({ expiresInDays: 1 }), expect: [401, 201, 404, 403, 404, 404, 403] },
  { route: "DELETE /api/v1/builds/[id]/shares/[shareId]", path: async (w) => { const s = await w.fresh.share(); return `/api/v1/builds/${s.buildId}/shares/${s.id}`; }, expect: [401, 200, 404, 404, 404, 404, 403] },
  { route: "POST /api/v1/builds/[id]/preview", path: (w) => `/api/v1/builds/${w.build}/preview`, body: () => ({ design: { lightEngine: { count: 1 } } }), expect: [401, 200, 404, 403, 404, 404, 403] },
  { route: "POST /api/v1/builds/[id]/solve", path: (w) => `/api/v1/builds/${w.build}/solve`, body: () => ({}), expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "GET /api/v1/builds/[id]/variants", path: (w) => `/api/v1/builds/${w.build}/variants`, expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "GET /api/v1/share/[token]", path: (w) => `/api/v1/share/${w.share.token}`, expect: same(200) },

  // —— reviews and comparisons
  { route: "GET /api/v1/reviews", path: () => "/api/v1/reviews", expect: [401, 200, 200, 200, 200, 200, 200] },
  { route: "GET /api/v1/reviews/[id]", path: (w) => `/api/v1/reviews/${w.review}`, expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "GET /api/v1/reviews/[id]/comments", path: (w) => `/api/v1/reviews/${w.review}/comments`, expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "POST /api/v1/reviews/[id]/comments", path: (w) => `/api/v1/reviews/${w.review}/comments`, body: () => ({ anchor: { kind: "node", key: "junction" }, body: "Check the pad." }), expect: [401, 201, 404, 201, 404, 404, 403] },
  { route: "GET /api/v1/reviews/[id]/shares", path: (w) => `/api/v1/reviews/${w.review}/shares`, expect: [401, 200, 404, 200, 404, 404, 403] },
  { route: "POST /api/v1/reviews/[id]/shares", path: (w) => `/api/v1/reviews/${w.review}/shares`, body: () => ({ expiresInDays: 1 }), expect: [401, 201, 404, 201, 404, 404, 403] },
  { route: "DELETE /api/v1/reviews/[id]/shares/[shareId]", path: async (w) => { const s = await w.fresh.reviewShare(); return `/api/v1/reviews/${s.reviewId}/shares/${s.id}`; }, expect: [401, 200, 404, 200, 404, 404, 403] },
  { route: "GET /api/v1/review-share/[token]", path: (w) => `/api/v1/review-share/${w.reviewShare.token}`, expect: same(200) },
  { route: "POST /api/v1/reviews/[id]/verdict", path: async (w) => `/api/v1/reviews/${(await w.fresh.review()).reviewId}/verdict`, body: () => ({ status: "approved", summary: "Fine." }), expect: [401, 403, 404, 200, 404, 404, 403] },
  { route: "GET /api/v1/compare", path: (w) => `/api/v1/compare?items=${w.build},${w.sharedBuild}`, expect: [401, 200, 404, 200, 404, 404, 200] },
  { route: "GET /api/v1/comparisons", path: () => "/api/v1/comparisons", expect: [401, 200, 200, 200, 200, 200, 200] },
  { route: "POST /api/v1/comparisons", path: () => "/api/v1/comparisons", body: (w) => ({ title: "Matrix pair", items: [{ buildId: w.build }, { buildId: w.sharedBuild }] }), expect: [401, 201, 404, 201, 404, 404, 201] },
  { route: "GET /api/v1/comparisons/[id]", path: (w) => `/api/v1/comparisons/${w.comparison}`, expect: [401, 200, 404, 200, 404, 404, 200] },
  // Classroom: objects of no class of anyone's (a made-up id) are 404 for every signed-in role.
  { route: "GET /api/v1/classes", path: () => "/api/v1/classes", expect: [401, 200, 200, 200, 200, 200, 200] },
  { route: "POST /api/v1/classes", path: () => "/api/v1/classes", body: () => ({ name: "Matrix class" }), expect: [401, 403, 403, 403, 201, 403, 201] },
  { route: "GET /api/v1/classes/[id]", path: () => "/api/v1/classes/no-such-class", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "PATCH /api/v1/classes/[id]", path: () => "/api/v1/classes/no-such-class", body: () => ({ name: "x" }), expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/classes/[id]/invitations", path: () => "/api/v1/classes/no-such-class/invitations", body: () => ({ emails: ["matrix@example.org"] }), expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/classes/join", path: () => "/api/v1/classes/join", body: () => ({ code: "ZZZZZZZZ" }), expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "DELETE /api/v1/classes/[id]/members/[userId]", path: () => "/api/v1/classes/no-such-class/members/no-such-user", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "GET /api/v1/classes/[id]/examples", path: () => "/api/v1/classes/no-such-class/examples", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/classes/[id]/examples", path: () => "/api/v1/classes/no-such-class/examples", body: (w) => ({ title: "x", buildId: w.build }), expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "GET /api/v1/classes/[id]/exercises", path: () => "/api/v1/classes/no-such-class/exercises", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/classes/[id]/exercises", path: () => "/api/v1/classes/no-such-class/exercises", body: (w) => ({ title: "x", buildId: w.build, dueAt: "2099-01-01T00:00:00Z" }), expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "GET /api/v1/examples/[id]", path: () => "/api/v1/examples/no-such-example", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "PATCH /api/v1/examples/[id]", path: () => "/api/v1/examples/no-such-example", body: () => ({ reveal: true }), expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/examples/[id]/fork", path: () => "/api/v1/examples/no-such-example/fork", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/examples/[id]/answers", path: () => "/api/v1/examples/no-such-example/answers", body: () => ({ key: "node:junction", value: 50 }), expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "GET /api/v1/examples/[id]/export", path: () => "/api/v1/examples/no-such-example/export", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "GET /api/v1/examples/link/[token]", path: () => "/api/v1/examples/link/no-such-token", expect: same(404) },
  { route: "GET /api/v1/exercises/[id]", path: () => "/api/v1/exercises/no-such-exercise", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/exercises/[id]/start", path: () => "/api/v1/exercises/no-such-exercise/start", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "GET /api/v1/exercises/[id]/handins", path: () => "/api/v1/exercises/no-such-exercise/handins", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/exercises/[id]/handins", path: () => "/api/v1/exercises/no-such-exercise/handins", body: (w) => ({ buildId: w.build }), expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "GET /api/v1/handins/[id]", path: () => "/api/v1/handins/no-such-handin", expect: [401, 404, 404, 404, 404, 404, 404] },
  { route: "POST /api/v1/handins/[id]/feedback", path: () => "/api/v1/handins/no-such-handin/feedback", body: () => ({ feedback: "x" }), expect: [401, 404, 404, 404, 404, 404, 404] },
];
