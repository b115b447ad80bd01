import { AMBIENT_ID } from "./ids";

/** A problem with how the parts of a network refer to each other (the schema checks each field alone). */
export interface ReferenceIssue {
  message: string;
  path: (string | number)[];
}

interface NetworkRefs {
  nodes: readonly { id: string }[];
  links: readonly {
    from: string;
    to: string;
    type: string;
    baseWidthM?: number;
    finCount?: number;
    finThicknessM?: number;
  }[];
  sources?: readonly { node: string }[];
}

/**
 * Checks ids and references: duplicates, the reserved `ambient`, links and sources that
 * name unknown nodes, links from a node to itself, fins that do not fit on their base.
 * Shared by the zod schema (so routes answer 400 with a path) and by the solvers (so a
 * direct caller gets the same message as a ThermalInputError).
 */
export function referenceIssues(network: NetworkRefs): ReferenceIssue[] {
  return checkReferences(network).issues;
}

/** The reference checks, and each node id's index in `nodes` (the compiler reuses it rather than building it again). */
export function checkReferences(network: NetworkRefs): { issues: ReferenceIssue[]; index: Map<string, number> } {
  const issues: ReferenceIssue[] = [];
  const seen = new Map<string, number>();
  // Plain loops and a local copy of the ambient id: this runs on every solve, and each closure
  // or imported binding read is a measurable part of a small network's set-up.
  const ambient = AMBIENT_ID;
  const { nodes, links } = network;
  for (let i = 0; i < nodes.length; i++) {
    const id = nodes[i]!.id;
    if (id === ambient) {
      issues.push({ message: `node id "${ambient}" is reserved for the fixed ambient node`, path: ["nodes", i, "id"] });
    } else if (seen.has(id)) {
      issues.push({ message: `duplicate node id "${id}" (also node ${(seen.get(id) ?? 0) + 1})`, path: ["nodes", i, "id"] });
    } else seen.set(id, i);
  }
  for (let i = 0; i < links.length; i++) {
    const link = links[i]!;
    if (link.from !== ambient && !seen.has(link.from)) issues.push({ message: `link names unknown node "${link.from}"`, path: ["links", i, "from"] });
    if (link.to !== ambient && !seen.has(link.to)) issues.push({ message: `link names unknown node "${link.to}"`, path: ["links", i, "to"] });
    if (link.from === link.to) issues.push({ message: `link joins node "${link.from}" to itself`, path: ["links", i, "to"] });
    if (link.type === "finned-heatsink" && link.baseWidthM !== undefined && link.finCount !== undefined && link.finThicknessM !== undefined) {
      if (link.finCount * link.finThicknessM >= link.baseWidthM) {
        issues.push({ message: `${link.finCount} fins of ${link.finThicknessM} m do not fit on a ${link.baseWidthM} m base`, path: ["links", i, "finThicknessM"] });
      }
    }
  }
  const sources = network.sources ?? [];
  for (let i = 0; i < sources.length; i++) {
    const node = sources[i]!.node;
    if (node === ambient) issues.push({ message: "a heat source cannot sit on the fixed ambient node", path: ["sources", i, "node"] });
    else if (!seen.has(node)) issues.push({ message: `source names unknown node "${node}"`, path: ["sources", i, "node"] });
  }
  return { issues, index: seen };
}

interface TransientRefs {
  network: { nodes: readonly { id: string }[] };
  durationS: number;
  stepS: number;
  initialC?: number | Record<string, number>;
  thresholds?: readonly { node: string }[];
}

/** Checks a warm-up request's step count and the node ids it names (shared by the schema and `solveTransient`). */
export function transientIssues(req: TransientRefs, limits: { maxSteps: number; maxValues: number }): ReferenceIssue[] {
  const issues: ReferenceIssue[] = [];
  if (!(req.durationS > 0) || !Number.isFinite(req.durationS)) issues.push({ message: "durationS must be a positive number", path: ["durationS"] });
  else if (!(req.stepS > 0) || !Number.isFinite(req.stepS)) issues.push({ message: "stepS must be a positive number", path: ["stepS"] });
  else {
    const steps = Math.ceil(req.durationS / req.stepS - 1e-9);
    if (req.stepS > req.durationS) issues.push({ message: "stepS must not exceed durationS", path: ["stepS"] });
    else if (steps > limits.maxSteps) issues.push({ message: `durationS / stepS gives ${steps} steps; at most ${limits.maxSteps}`, path: ["stepS"] });
    else if ((steps + 1) * req.network.nodes.length > limits.maxValues) {
      issues.push({ message: `the answer would hold more than ${limits.maxValues} values; use a larger stepS`, path: ["stepS"] });
    }
  }
  const ids = new Set(req.network.nodes.map((n) => n.id));
  if (req.initialC !== undefined && typeof req.initialC === "object") {
    for (const id of Object.keys(req.initialC)) {
      if (!ids.has(id)) issues.push({ message: `initialC names unknown node "${id}"`, path: ["initialC", id] });
    }
  }
  req.thresholds?.forEach((t, i) => {
    if (!ids.has(t.node)) issues.push({ message: `threshold names unknown node "${t.node}"`, path: ["thresholds", i, "node"] });
  });
  return issues;
}
