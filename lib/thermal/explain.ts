import { AMBIENT_ID } from "./ids";
import { extend } from "./record";
import { conductionResistance, convectionResistance, declaredResistance } from "./elements/basic";
import { finnedHeatsink } from "./elements/heatsink";
import { naturalConvection } from "./elements/natural-convection";
import { radiationExchange } from "./elements/radiation";
import type { Network, NetworkLink } from "./schema";
import type { SteadyResult } from "./solve-steady";
import type { Trace } from "./trace";

/** The trace of one link at given end temperatures (°C). */
export function traceLink(link: NetworkLink, fromC: number, toC: number): Trace {
  switch (link.type) {
    case "resistance":
      return declaredResistance({ kelvinPerWatt: link.kelvinPerWatt }).trace;
    case "conduction":
      return conductionResistance(link).trace;
    case "convection":
      return convectionResistance(link).trace;
    case "natural-convection":
      return naturalConvection(extend(link, { surfaceC: fromC, fluidC: toC })).trace;
    case "radiation":
      return radiationExchange(extend(link, { surfaceC: fromC, surroundingsC: toC })).trace;
    case "finned-heatsink":
      return finnedHeatsink(extend(link, { surfaceC: fromC, ambientC: toC })).trace;
  }
}

/** Traces of every link at the steady solution, in the order of `network.links`. */
export function explainLinks(network: Network, result: SteadyResult): Trace[] {
  const t = (id: string) => (id === AMBIENT_ID ? network.ambientC : result.temperaturesC[id]!);
  return network.links.map((l) => traceLink(l, t(l.from), t(l.to)));
}
