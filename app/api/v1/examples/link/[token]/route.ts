import { openExampleLink } from "@/server/classes/link";
import { json, route } from "@/server/route";

/** A worked example opened by its link: no sign-in, read-only, hidden values stay hidden. */
export const GET = route<{ params: Promise<{ token: string }> }>(async (_request, { params }) => {
  const view = await openExampleLink((await params).token);
  return json({ ...view, example: { ...view.example, classId: undefined, buildId: undefined } });
});
