import type { Network } from "./schema";
import type { SteadyResult } from "./solve-steady";
import { AMBIENT_ID } from "./ids";
import { ThermalInputError } from "./errors";

export interface RiseStep {
  /** Index of the link in `network.links`. */
  link: number;
  from: string;
  to: string;
  type: string;
  label?: string;
  /** Temperature drop across this step, K (from the hotter end to the colder). */
  deltaK: number;
  /** Heat through the link in the direction of the walk, W. */
  watts: number;
  kelvinPerWatt: number;
  /** Share of the heat leaving the step's hot end that takes this link. */
  shareOfOutflow: number;
}

export interface RiseBreakdown {
  node: string;
  riseK: number;
  steps: RiseStep[];
  /** Rise not covered by the walk (0 unless the walk met a node that sheds no heat). */
  remainderK: number;
}

/**
 * How a node's rise above ambient splits along the heat's way out: from the node, follow
 * at each step the link carrying the most heat away, until ambient. The drops telescope,
 * so they add up to the rise exactly — the temperature ladder of the Budget screen.
 */
export function breakdownRise(network: Network, result: SteadyResult, node: string): RiseBreakdown {
  if (!network.nodes.some((n) => n.id === node)) throw new ThermalInputError("bad_request:breakdown", `unknown node "${node}"`, "node");
  const temp = (id: string) => (id === AMBIENT_ID ? network.ambientC : result.temperaturesC[id]!);
  const rise = temp(node) - network.ambientC;
  const steps: RiseStep[] = [];
  const visited = new Set<string>();
  let here = node;
  while (here !== AMBIENT_ID && !visited.has(here)) {
    visited.add(here);
    let best = -1;
    let bestW = 0;
    let outflow = 0;
    result.links.forEach((l, i) => {
      const w = l.from === here ? l.watts : l.to === here ? -l.watts : 0;
      if (w > 0) {
        outflow += w;
        if (w > bestW) {
          bestW = w;
          best = i;
        }
      }
    });
    if (best < 0) break;
    const l = result.links[best]!;
    const next = l.from === here ? l.to : l.from;
    steps.push({
      link: best,
      from: here,
      to: next,
      type: l.type,
      ...(l.label ? { label: l.label } : {}),
      deltaK: temp(here) - temp(next),
      watts: bestW,
      kelvinPerWatt: l.kelvinPerWatt,
      shareOfOutflow: bestW / outflow,
    });
    here = next;
  }
  const covered = steps.reduce((s, x) => s + x.deltaK, 0);
  return { node, riseK: rise, steps, remainderK: rise - covered };
}
