import { markNotificationsRead } from "@/db/queries/notifications";
import { markReadSchema } from "@/lib/reviews/api-schemas";
import { requireUser } from "@/server/auth/session";
import { json, readJson, route } from "@/server/route";

/** Marks the caller's notifications read: the listed ones, or all when no ids are given. */
export const POST = route(async (request) => {
  const user = await requireUser();
  const input = await readJson(request, markReadSchema, "notifications");
  return json({ marked: await markNotificationsRead({ userId: user.id, ids: input.ids }) });
});
