import { toKelvin } from "./constants";
import { ThermalInputError } from "./errors";
import { AMBIENT_ID } from "./ids";
import { linkModel, type LinkModel } from "./link-models";
import type { Network } from "./schema";
import { minimumDegreeOrder } from "./solver/ordering";
import { referenceIssues } from "./validate";

export interface CompiledLink {
  /** Solver index of the `from` node, or −1 for ambient. */
  a: number;
  /** Solver index of the `to` node, or −1 for ambient. */
  b: number;
  model: LinkModel;
}

/**
 * A network turned into what the loops need: nodes renumbered in elimination order,
 * capacities and sources in typed arrays (solver order), kelvin throughout. Sources are
 * folded into P_i(T) = p0_i + p1_i·T.
 */
export interface CompiledNetwork {
  n: number;
  /** Node ids in solver order. */
  ids: string[];
  /** Solver index of each node in the order of `network.nodes`. */
  solverIndex: Int32Array;
  ambientK: number;
  capacity: Float64Array;
  p0: Float64Array;
  p1: Float64Array;
  links: CompiledLink[];
  linear: boolean;
  network: Network;
}

export const formatPath = (path: readonly (string | number)[]): string =>
  path.map((p) => (typeof p === "number" ? `[${p}]` : String(p))).join(".").replace(/\.\[/g, "[");

/** Throws the first reference problem as a ThermalInputError (direct callers that skipped the schema get the same message). */
export function assertReferences(network: Network): void {
  const issue = referenceIssues(network)[0];
  if (issue) throw new ThermalInputError("bad_request:network", `${formatPath(issue.path)}: ${issue.message}`, formatPath(issue.path));
}

export function compileNetwork(network: Network): CompiledNetwork {
  assertReferences(network);
  const nodeCount = network.nodes.length;
  const original = new Map(network.nodes.map((node, i) => [node.id, i]));
  const idx = (id: string) => (id === AMBIENT_ID ? -1 : original.get(id)!);

  const edges = network.links.map((l) => [idx(l.from), idx(l.to)] as const);
  assertPathToAmbient(network, edges);

  const order = minimumDegreeOrder(nodeCount, edges);
  const solverIndex = new Int32Array(nodeCount);
  order.forEach((orig, k) => (solverIndex[orig] = k));
  const at = (i: number) => (i < 0 ? -1 : solverIndex[i]!);

  const capacity = new Float64Array(nodeCount);
  network.nodes.forEach((node, i) => (capacity[solverIndex[i]!] = node.heatCapacityJPerK ?? 0));
  const p0 = new Float64Array(nodeCount);
  const p1 = new Float64Array(nodeCount);
  const ambientK = toKelvin(network.ambientC);
  for (const s of network.sources ?? []) {
    const k = solverIndex[original.get(s.node)!]!;
    const slope = s.wattsPerKelvin ?? 0;
    const refK = s.referenceC === undefined ? ambientK : toKelvin(s.referenceC);
    p0[k]! += s.watts - slope * refK;
    p1[k]! += slope;
  }
  const links = network.links.map((l, i) => ({ a: at(edges[i]![0]), b: at(edges[i]![1]), model: linkModel(l) }));
  return {
    n: nodeCount,
    ids: Array.from(order, (orig) => network.nodes[orig]!.id),
    solverIndex,
    ambientK,
    capacity,
    p0,
    p1,
    links,
    linear: links.every((l) => l.model.linear) && p1.every((v) => v === 0),
    network,
  };
}

function assertPathToAmbient(network: Network, edges: readonly (readonly [number, number])[]): void {
  const n = network.nodes.length;
  const adjacency: number[][] = Array.from({ length: n }, () => []);
  const reached = new Uint8Array(n);
  const queue: number[] = [];
  for (const [a, b] of edges) {
    if (a >= 0 && b >= 0) {
      adjacency[a]!.push(b);
      adjacency[b]!.push(a);
    } else {
      const k = a >= 0 ? a : b;
      if (k >= 0 && !reached[k]) {
        reached[k] = 1;
        queue.push(k);
      }
    }
  }
  while (queue.length > 0) {
    const k = queue.pop()!;
    for (const m of adjacency[k]!) {
      if (!reached[m]) {
        reached[m] = 1;
        queue.push(m);
      }
    }
  }
  const stranded = network.nodes.map((node, i) => ({ id: node.id, i })).filter((x) => !reached[x.i]);
  if (stranded.length > 0) {
    const names = stranded.slice(0, 20).map((x) => `"${x.id}"`).join(", ") + (stranded.length > 20 ? ` and ${stranded.length - 20} more` : "");
    throw new ThermalInputError(
      "unprocessable:network",
      `no heat path to ambient from node${stranded.length > 1 ? "s" : ""} ${names}`,
      `nodes[${stranded[0]!.i}].id`,
    );
  }
}
