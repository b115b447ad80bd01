import { openReviewShare } from "@/server/reviews/review-share";
import { json, route } from "@/server/route";

/** No sign-in: the token is the permission. The reviewed revision's verdict, comments and results, without private values. */
export const GET = route<{ params: Promise<{ token: string }> }>(async (_request, { params }) => {
  return json(await openReviewShare({ token: (await params).token }));
});
