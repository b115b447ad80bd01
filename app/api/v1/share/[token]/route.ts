import { openShare } from "@/server/reviews/share";
import { json, route } from "@/server/route";

/** No sign-in: the token is the permission. Answers the build summary, the design, its public parts and the result. */
export const GET = route<{ params: Promise<{ token: string }> }>(async (_request, { params }) => {
  return json(await openShare({ token: (await params).token }));
});
