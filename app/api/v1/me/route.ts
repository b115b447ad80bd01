import { requireUser } from "@/server/auth/session";
import { json, route } from "@/server/route";

export const GET = route(async () => {
  const user = await requireUser();
  return json({
    user: {
      id: user.id,
      email: user.email,
      displayName: user.displayName,
      role: user.role,
      lengthUnits: user.lengthUnits,
      temperatureUnit: user.temperatureUnit,
    },
  });
});
