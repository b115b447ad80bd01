import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { partSchema } from "@/lib/parts";
import { fieldErrors, describeFieldError } from "@/lib/units";
import { db } from "@/db/client";
import { newId } from "@/db/queries/users";
import { parts } from "@/db/schema";
import { CATALOGUE, type CatalogueKey } from "./catalogue-data";

export { CATALOGUE, type CatalogueKey } from "./catalogue-data";

/**
 * Seeds the shared catalogue, owned by the admin demo account and public. Its parts are
 * invented estimates, so none is verified (nobody checked them against a datasheet).
 * Idempotent: a part is found by owner + name and refreshed in place, so its id (which
 * builds refer to) survives every re-seed. Returns the part ids by catalogue key.
 */
export async function seedCatalogue({ adminId }: { adminId: string }): Promise<Record<CatalogueKey, string>> {
  const entries = Object.entries(CATALOGUE) as [CatalogueKey, (typeof CATALOGUE)[CatalogueKey]][];
  const names = entries.map(([, input]) => input.name);
  const existing = await db()
    .select({ id: parts.id, name: parts.name })
    .from(parts)
    .where(and(eq(parts.ownerId, adminId), inArray(parts.name, names)));
  const idByName = new Map(existing.map((row) => [row.name, row.id]));
  const ids = {} as Record<CatalogueKey, string>;
  const now = new Date();
  await db().transaction(async (tx) => {
    for (const [key, input] of entries) {
      const parsed = partSchema.safeParse({ ...input, visibility: "public" });
      if (!parsed.success) throw new Error(`catalogue part ${key}: ${fieldErrors(parsed.error).map(describeFieldError).join("; ")}`);
      const part = parsed.data;
      const values = {
        kind: part.kind,
        name: part.name,
        provenance: part.provenance,
        provenanceNote: part.provenanceNote ?? null,
        visibility: "public" as const,
        costEur: part.costEur ?? null,
        verified: false,
        specs: part.specs,
        curves: part.curves,
        updatedAt: now,
      };
      const id = idByName.get(part.name);
      if (id) {
        await tx.update(parts).set(values).where(eq(parts.id, id));
        ids[key] = id;
      } else {
        const fresh = newId();
        await tx.insert(parts).values({ ...values, id: fresh, ownerId: adminId, createdAt: now });
        ids[key] = fresh;
      }
    }
  });
  return ids;
}

/** The ids of already-seeded catalogue parts by key (for seeds that run later, e.g. builds). */
export async function catalogueIds({ adminId }: { adminId: string }): Promise<Partial<Record<CatalogueKey, string>>> {
  const rows = await db()
    .select({ id: parts.id, name: parts.name })
    .from(parts)
    .where(and(eq(parts.ownerId, adminId), inArray(parts.name, Object.values(CATALOGUE).map((p) => p.name))));
  const byName = new Map(rows.map((r) => [r.name, r.id]));
  const out: Partial<Record<CatalogueKey, string>> = {};
  for (const [key, input] of Object.entries(CATALOGUE) as [CatalogueKey, { name: string }][]) {
    const id = byName.get(input.name);
    if (id) out[key] = id;
  }
  return out;
}
