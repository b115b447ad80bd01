import { labelFor } from "@/lib/messages/plain-issues";
import { toKelvin } from "./constants";
import { ThermalInputError } from "./errors";
import { AMBIENT_ID } from "./ids";
import { linkModel } from "./link-models";
import { extend } from "./record";
import type { Network } from "./schema";
import { groupLinks } from "./solver/assemble";
import type { CompiledLink, CompiledNetwork } from "./solver/compiled";
import { minimumDegreeOrder, type EliminationOrder } from "./solver/ordering";
import { scratch } from "./solver/scratch";
import { checkReferences } from "./validate";

export type { CompiledLink, CompiledNetwork } from "./solver/compiled";

export const formatPath = (path: readonly (string | number)[]): string =>
  path.map((p) => (typeof p === "number" ? `[${p}]` : String(p))).join(".").replace(/\.\[/g, "[");

/** Throws the first reference problem as a ThermalInputError (direct callers that skipped the schema get the same message); returns each id's index in `nodes`. */
export function assertReferences(network: Network): Map<string, number> {
  const { issues, index } = checkReferences(network);
  const issue = issues[0];
  if (issue) throw new ThermalInputError("bad_request:network", `${labelFor(issue.path)}: ${issue.message}`, formatPath(issue.path));
  return index;
}

export function compileNetwork(network: Network): CompiledNetwork {
  const original = assertReferences(network);
  const mark = scratch.mark();
  try {
    return compileChecked(network, original);
  } finally {
    scratch.release(mark);
  }
}

function compileChecked(network: Network, original: Map<string, number>): CompiledNetwork {
  const ambient = AMBIENT_ID;
  const nodeCount = network.nodes.length;
  const linkCount = network.links.length;
  // ends[2l], ends[2l+1]: the link's nodes as indices into `network.nodes`, −1 for ambient.
  const ends = scratch.ints(2 * linkCount);
  for (let l = 0; l < linkCount; l++) {
    const link = network.links[l]!;
    ends[2 * l] = link.from === ambient ? -1 : original.get(link.from)!;
    ends[2 * l + 1] = link.to === ambient ? -1 : original.get(link.to)!;
  }
  assertPathToAmbient(network, ends);

  const { order, solverIndex, pattern } = orderFor(nodeCount, ends);
  // One buffer for the three per-node arrays (see solver/scratch.ts on what each allocation costs).
  const perNode = new Float64Array(3 * nodeCount);
  const capacity = perNode.subarray(0, nodeCount);
  const p0 = perNode.subarray(nodeCount, 2 * nodeCount);
  const p1 = perNode.subarray(2 * nodeCount);
  for (let i = 0; i < nodeCount; i++) capacity[solverIndex[i]!] = network.nodes[i]!.heatCapacityJPerK ?? 0;
  const ambientK = toKelvin(network.ambientC);
  foldSources(network.sources ?? [], original, solverIndex, ambientK, p0, p1);
  let linear = true;
  for (let k = 0; k < nodeCount; k++) if (p1[k] !== 0) linear = false;
  const links: CompiledLink[] = new Array<CompiledLink>(linkCount);
  for (let l = 0; l < linkCount; l++) {
    const model = linkModel(network.links[l]!);
    const a = ends[2 * l]!;
    const b = ends[2 * l + 1]!;
    links[l] = { a: a < 0 ? -1 : solverIndex[a]!, b: b < 0 ? -1 : solverIndex[b]!, model };
    if (!model.linear) linear = false;
  }
  const ids = new Array<string>(nodeCount);
  for (let k = 0; k < nodeCount; k++) ids[k] = network.nodes[order[k]!]!.id;
  return { n: nodeCount, ids, solverIndex, ambientK, capacity, p0, p1, links, pattern, groups: groupLinks(links), linear, network };
}

/** Sources folded into P_i(T) = p0_i + p1_i·T (solver order, kelvin), adding to what p0 and p1 hold. */
function foldSources(sources: Network["sources"], original: ReadonlyMap<string, number>, solverIndex: Int32Array, ambientK: number, p0: Float64Array, p1: Float64Array): void {
  for (const s of sources) {
    const k = solverIndex[original.get(s.node)!]!;
    const slope = s.wattsPerKelvin ?? 0;
    const refK = s.referenceC === undefined ? ambientK : toKelvin(s.referenceC);
    p0[k]! += s.watts - slope * refK;
    p1[k]! += slope;
  }
}

/**
 * Replaces a compiled network's sources in place by `sources` on the same nodes (a search
 * over a heat, such as a throttled charge current, changes only the sources between its
 * probes: one compilation serves them all). The result is what compiling the network with
 * those sources gives.
 */
export function setCompiledSources(c: CompiledNetwork, sources: Network["sources"]): void {
  const original = new Map(c.network.nodes.map((node, i) => [node.id, i] as const));
  for (const s of sources) if (!original.has(s.node)) throw new ThermalInputError("bad_request:network", `unknown node "${s.node}" for a source`, "sources");
  c.p0.fill(0);
  c.p1.fill(0);
  foldSources(sources, original, c.solverIndex, c.ambientK, c.p0, c.p1);
  let linear = c.links.every((l) => l.model.linear);
  for (let k = 0; k < c.n; k++) if (c.p1[k] !== 0) linear = false;
  c.linear = linear;
  c.network = extend(c.network, { sources });
}

/**
 * The last few elimination orders worked out, with the link ends they were for. A search or
 * a fixed point solves the same heat path dozens of times with other values (a resistance,
 * a source): its order and fill pattern, a third of a compilation, are then looked up (the
 * solvers only read them). Four entries cover a search alternating between the network and
 * its variant with a link left out.
 */
const ORDER_CACHE_SIZE = 4;
const orderCache: { n: number; ends: Int32Array; order: EliminationOrder }[] = [];
let orderCacheNext = 0;

function orderFor(n: number, ends: Int32Array): EliminationOrder {
  for (const c of orderCache) if (c.n === n && sameInts(c.ends, ends)) return c.order;
  const order = minimumDegreeOrder(n, ends);
  // `ends` is scratch memory: the entry keeps a copy.
  const entry = { n, ends: Int32Array.from(ends), order };
  if (orderCache.length < ORDER_CACHE_SIZE) orderCache.push(entry);
  else orderCache[orderCacheNext] = entry;
  orderCacheNext = (orderCacheNext + 1) % ORDER_CACHE_SIZE;
  return order;
}

function sameInts(a: Int32Array, b: Int32Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** Representative of i's set, halving the path on the way. */
function root(parent: Int32Array, i: number): number {
  while (parent[i] !== i) {
    const up = parent[parent[i]!]!;
    parent[i] = up;
    i = up;
  }
  return i;
}

/** Union–find over the nodes plus ambient (index n): a node is stranded when it ends up outside ambient's set. */
function assertPathToAmbient(network: Network, ends: Int32Array): void {
  const n = network.nodes.length;
  const parent = scratch.ints(n + 1);
  for (let i = 0; i <= n; i++) parent[i] = i;
  for (let e = 0; e < ends.length; e += 2) {
    const a = root(parent, ends[e]! < 0 ? n : ends[e]!);
    const b = root(parent, ends[e + 1]! < 0 ? n : ends[e + 1]!);
    if (a !== b) parent[a] = b;
  }
  const ambient = root(parent, n);
  const stranded: number[] = [];
  for (let i = 0; i < n; i++) if (root(parent, i) !== ambient) stranded.push(i);
  if (stranded.length > 0) {
    const names = stranded.slice(0, 20).map((i) => `"${network.nodes[i]!.id}"`).join(", ") + (stranded.length > 20 ? ` and ${stranded.length - 20} more` : "");
    throw new ThermalInputError(
      "unprocessable:network",
      `no heat path to ambient from node${stranded.length > 1 ? "s" : ""} ${names}`,
      `nodes[${stranded[0]!}].id`,
    );
  }
}
