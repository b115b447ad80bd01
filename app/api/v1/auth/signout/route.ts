import { endSession } from "@/server/auth/session";
import { json, route } from "@/server/route";

export const POST = route(async () => {
  await endSession();
  return json({ ok: true });
});
