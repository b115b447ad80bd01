import "server-only";
import type { RevisionRow } from "@/db/queries/builds";
import type { FitResult } from "@/lib/bench/fit";
import type { BuildViewer } from "@/lib/builds/access";
import type { LoadedBuild } from "@/server/builds/load";
import { evaluateRevision, revisionPartRecords } from "@/server/builds/solve";
import { evidenceForPart } from "./load";

export interface MeasuredSinkEffect {
  partId: string;
  partName: string;
  run: { id: string; title: string };
  sinkToAirKPerW: { value: number; low: number; high: number };
  /** The junction in each driver mode with the sink at the fit's value and at the two ends of its interval. */
  modes: { name: string; limitC: number; atValueC: number; atLowC: number; atHighC: number }[];
}

function heatsinkPartId(design: unknown): string | undefined {
  const d = design as { lightEngine?: { heatsink?: { partId?: unknown } } } | null;
  const id = d?.lightEngine?.heatsink?.partId;
  return typeof id === "string" ? id : undefined;
}

/**
 * When a revision's heatsink is a measured part with a bench run behind it, the Budget's
 * junction at the low and high ends of the fit's interval: how much the measurement's own
 * uncertainty moves the answer. Null for any other sink.
 */
export async function measuredSinkEffect({ build, revision, viewer }: { build: LoadedBuild; revision: RevisionRow; viewer: BuildViewer }): Promise<MeasuredSinkEffect | null> {
  const partId = heatsinkPartId(revision.design);
  if (!partId) return null;
  // The parts as the revision keeps them (its snapshot), as its Budget is worked out from.
  const records = await revisionPartRecords({ build, revision });
  const record = records.get(partId);
  if (!record || record.kind !== "heatsink" || record.provenance !== "measured" || record.specs.rating !== "declared") return null;
  const runs = await evidenceForPart({ partId, viewer });
  const fitRun = runs.find((r) => r.fit);
  if (!fitRun) return null;
  const fit = fitRun.fit as FitResult;
  const at = (kPerW: number) => {
    const changed = new Map(records);
    changed.set(partId, { ...record, specs: { ...record.specs, sinkToAirKPerW: kPerW } });
    return evaluateRevision({ design: revision.design, records: changed });
  };
  const [mid, low, high] = [at(Number(record.specs.sinkToAirKPerW)), at(fit.sinkToAirKPerW.low), at(fit.sinkToAirKPerW.high)];
  const junction = (e: typeof mid, id: string) => e.scenarios.find((s) => s.id === id)?.thermal?.limits.find((l) => l.id === "junction");
  const modes = mid.scenarios
    .filter((s) => s.kind === "mode")
    .flatMap((s) => {
      const m = junction(mid, s.id);
      const lo = junction(low, s.id);
      const hi = junction(high, s.id);
      return m && lo && hi ? [{ name: s.name, limitC: m.limitC, atValueC: m.temperatureC, atLowC: lo.temperatureC, atHighC: hi.temperatureC }] : [];
    });
  return { partId, partName: record.name, run: { id: fitRun.id, title: fitRun.title }, sinkToAirKPerW: fit.sinkToAirKPerW, modes };
}
