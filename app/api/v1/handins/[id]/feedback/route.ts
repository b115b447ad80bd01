import { setFeedback } from "@/db/queries/classwork";
import { getUserById } from "@/db/queries/users";
import { feedbackSchema } from "@/lib/classroom/api-schemas";
import { requireUser } from "@/server/auth/session";
import { assertTeaching, loadHandin } from "@/server/classes/load";
import { mailFeedback } from "@/server/classes/mail";
import { json, readJson, route } from "@/server/route";

/** Feedback (and an optional mark) on one hand-in; the student is told in the app and by e-mail. */
export const POST = route<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const { handin, cls } = await loadHandin({ id: (await params).id, viewer: user });
  const input = await readJson(request, feedbackSchema, "feedback");
  assertTeaching(cls);
  const mark = input.mark ? input.mark : null;
  const href = `/classes/${cls.id}/exercises/${handin.exerciseId}`;
  await setFeedback({ id: handin.id, feedback: input.feedback, mark, by: user.id, notify: { userId: handin.studentId, text: `Feedback from ${user.displayName} on your hand-in: ${handin.exerciseTitle}`.slice(0, 500), href } });
  const student = await getUserById({ id: handin.studentId });
  const mailed = student ? await mailFeedback({ to: student.email, classId: cls.id, exerciseId: handin.exerciseId, exerciseTitle: handin.exerciseTitle, instructorName: user.displayName, mark }) : false;
  return json({ handin: { id: handin.id, feedback: input.feedback, mark }, mailed });
});
