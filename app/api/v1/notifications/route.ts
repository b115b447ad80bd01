import { listNotifications } from "@/db/queries/notifications";
import { requireUser } from "@/server/auth/session";
import { json, route } from "@/server/route";

export const GET = route(async () => {
  const user = await requireUser();
  return json(await listNotifications({ userId: user.id }));
});
