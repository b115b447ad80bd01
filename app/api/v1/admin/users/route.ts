import { listUsers } from "@/db/queries/users";
import { requireUser } from "@/server/auth/session";
import { json, route } from "@/server/route";

export const GET = route(async () => {
  await requireUser("admin");
  return json({ users: await listUsers() });
});
