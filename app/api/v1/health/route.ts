import { pingDatabase } from "@/db/queries/health";
import { json, route } from "@/server/route";

export const GET = route(async () => {
  await pingDatabase();
  return json({ ok: true });
});
