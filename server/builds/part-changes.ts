import "server-only";
import type { RevisionRow } from "@/db/queries/builds";
import { describePartChanges } from "@/lib/parts/spec-diff";
import { loadDesignParts, type LoadedBuild } from "./load";
import { revisionPartRecords } from "./solve";

export interface PartChange {
  partId: string;
  name: string;
  kind: string;
  /** What moved, in words ("Maximum junction temperature: 150 °C → 135 °C"). */
  changes: string[];
}

/**
 * The parts behind a revision that changed in the bin since its snapshot was taken (as the
 * build's owner sees them now). The revision itself never moves; this says what a new
 * revision with the current parts would pick up.
 */
export async function partChangesSince({ build, revision }: { build: LoadedBuild; revision: RevisionRow }): Promise<PartChange[]> {
  const snapshot = await revisionPartRecords({ build, revision });
  const current = await loadDesignParts({ design: revision.design, viewer: { id: build.ownerId, role: "maker" } });
  const out: PartChange[] = [];
  for (const [id, before] of snapshot) {
    const after = current.get(id);
    if (!after) {
      out.push({ partId: id, name: before.name, kind: before.kind, changes: ["no longer available to the build's owner: a new revision cannot use it"] });
      continue;
    }
    if (after.updatedAt.getTime() === before.updatedAt.getTime()) continue;
    const changes = describePartChanges(before, after);
    if (changes.length) out.push({ partId: id, name: after.name, kind: after.kind, changes });
  }
  return out;
}
