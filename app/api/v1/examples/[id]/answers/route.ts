import { withinTolerance } from "@/lib/classroom/access";
import { answerSchema } from "@/lib/classroom/api-schemas";
import { valueOf } from "@/lib/classroom/derivation";
import { ApiError } from "@/lib/http/api-error";
import { requireUser } from "@/server/auth/session";
import { solveExample } from "@/server/classes/examples";
import { loadExample } from "@/server/classes/load";
import { consumeAnswerCheck } from "@/server/rate-limit";
import { json, readJson, route } from "@/server/route";

/** Checks a student's answer to a hidden value against the tolerance; the value itself is not told. */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const { example } = await loadExample({ id: (await params).id, viewer: user });
  const input = await readJson(request, answerSchema, "answer");
  if (!example.hidden.includes(input.key)) throw new ApiError("bad_request:answer", "This value is not one of the example's questions.", "key");
  await consumeAnswerCheck(user.id, example.id, input.key);
  const { derivation } = await solveExample(example);
  const target = derivation ? valueOf(derivation, input.key) : null;
  if (!target) throw new ApiError("unprocessable:answer", "This value could not be worked out for the example, so answers cannot be checked.", "key");
  return json({ key: input.key, correct: withinTolerance(input.value, target.value, example.tolerancePercent), tolerancePercent: example.tolerancePercent, unit: target.unit });
});
