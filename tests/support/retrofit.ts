// Builds for the review, share and compare tests: parts made through the API (the unit
// fixtures' generic parts) and the three ways of cooling the driver as variants.
import { GOOD_PARTS } from "../unit/parts/fixtures";
import { Client, uniqueEmail } from "./http";
import { signUp } from "./mail";

export type PartIds = Record<keyof typeof GOOD_PARTS, string>;

export async function createParts(client: Client, visibility: "private" | "shared" | "public" = "shared"): Promise<PartIds> {
  const ids = {} as PartIds;
  for (const [kind, part] of Object.entries(GOOD_PARTS) as [keyof typeof GOOD_PARTS, (typeof GOOD_PARTS)[keyof typeof GOOD_PARTS]][]) {
    const r = await client.post("/api/v1/parts", { ...part, visibility });
    if (r.status !== 201) throw new Error(`part ${kind}: ${r.status} ${JSON.stringify(r.body)}`);
    ids[kind] = (r.body.part as { id: string }).id;
  }
  return ids;
}

export const COOLINGS = ["strapped", "ground-plane-to-wall", "floating"] as const;
export type Cooling = (typeof COOLINGS)[number];

export function retrofitDesign(ids: PartIds, cooling: Cooling, ambientC = 25) {
  const driverCooling =
    cooling === "strapped"
      ? { kind: "strapped", spreader: { partId: ids.spreader }, adhesive: { partId: ids.interface } }
      : cooling === "ground-plane-to-wall"
        ? { kind: "ground-plane-to-wall", interface: { partId: ids.interface } }
        : { kind: "floating" };
  return {
    housing: { partId: ids.housing },
    lightEngine: {
      emitter: { partId: ids.emitter },
      count: 1,
      interface: { partId: ids.interface },
      heatsink: { partId: ids.heatsink },
      mount: { kind: "pressed-to-wall", interface: { partId: ids.interface } },
    },
    driver: { part: { partId: ids.driver }, cooling: driverCooling },
    pack: { cell: { partId: ids.cell }, series: 1, parallel: 2, protection: { partId: ids.protection }, charger: { partId: ids.charger } },
    environment: { ambientC },
    costs: { extras: [], comparableNewLightEur: 45 },
  };
}

export async function newBuild(client: Client, body: Record<string, unknown>): Promise<string> {
  const r = await client.post("/api/v1/builds", body);
  if (r.status !== 201) throw new Error(`build: ${r.status} ${JSON.stringify(r.body)}`);
  return (r.body.build as { id: string }).id;
}

/** A new account, promoted by the admin when another role is wanted. */
export async function newUser(admin: Client, role: "maker" | "reviewer", tag: string): Promise<{ client: Client; id: string; email: string }> {
  const client = new Client();
  const email = uniqueEmail(tag);
  const r = await signUp(client, { email, password: "long enough pw", displayName: `Test ${tag}` });
  if (r.status !== 201) throw new Error(`signup: ${r.status} ${JSON.stringify(r.body)}`);
  const id = r.body.user!.id;
  if (role !== "maker") {
    const p = await admin.patch(`/api/v1/admin/users/${id}`, { role });
    if (p.status !== 200) throw new Error(`role: ${p.status} ${JSON.stringify(p.body)}`);
  }
  return { client, id, email };
}
