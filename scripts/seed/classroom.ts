import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { createBuild, getRevision } from "@/db/queries/builds";
import { addMember, createClass } from "@/db/queries/classes";
import { createExample, createExercise, createHandin, putCopy, setFeedback } from "@/db/queries/classwork";
import { createUser } from "@/db/queries/users";
import { builds, classes, users } from "@/db/schema";
import { collectPartIds } from "@/lib/builds/part-ids";
import { hashPassword } from "@/server/auth/password";
import { newJoinCode } from "@/server/classes/tokens";

/** The evening course's two students (makers by account; students in the class). */
export const DEMO_STUDENTS = [
  { email: "student1@sinkwise.test", displayName: "Wren Alloway (evening course)", can: "student: forks worked examples, hands in exercises" },
  { email: "student2@sinkwise.test", displayName: "Jory Pendeen (evening course)", can: "student: handed in late, no feedback yet" },
] as const;

const CLASS_NAME = "Evening course: how heat leaves an LED retrofit";
const DAY = 86_400_000;

const NARRATIVE_LANTERN = `The square lantern's COB emitter takes its power from the driver; most of it becomes heat at the junction.
Follow that heat outwards: each link adds a temperature step $\\Delta T = R \\cdot Q$, so the junction sits at

$$T_j = T_{air} + \\sum_i R_i \\, Q_i$$

summed along the path the heat takes. Open each step below to see the formula, its inputs and where they come from.

**Try this:** fork the example and change how the driver is cooled — strapped with copper tape, pressed to the wall, or floating free — then compare.`;

const NARRATIVE_INSPECTION = `The inspection lamp carries two star emitters in an aluminium tube, with the driver floating inside.

Some values below are **blanks**: work them out from the inputs shown and check your answer. Start with the heat the driver loses, $P_{loss} = P_{out} \\left( \\frac{1}{\\eta} - 1 \\right)$, then find the junction temperature.`;

async function userId(email: string): Promise<string> {
  const row = await db().select({ id: users.id }).from(users).where(eq(users.email, email)).limit(1);
  return row[0]!.id;
}

/** A copy of a demo build's first revision owned by someone else (idempotent by owner and title). */
async function copyOf(sourceId: string, ownerId: string, title: string, summary: string): Promise<string> {
  const found = await db().select({ id: builds.id }).from(builds).where(and(eq(builds.ownerId, ownerId), eq(builds.title, title))).limit(1);
  if (found[0]) return found[0].id;
  const revision = await getRevision({ buildId: sourceId, number: 1 });
  if (!revision) throw new Error(`demo build ${sourceId} has no revision 1`);
  return (await createBuild({ ownerId, title, summary, visibility: "private", design: revision.design, partIds: collectPartIds(revision.design), note: "Copied for the evening course" })).id;
}

/**
 * The workshop's evening course: the demo instructor, two students, two worked examples
 * (the second with hidden values) and one exercise whose due date has passed, with two
 * hand-ins (one late) and feedback on the on-time one. Idempotent: skipped when the class exists.
 */
export async function seedClassroom({ password, instructorId, builds: byKey }: { password: string; instructorId: string; builds: Record<string, string> }): Promise<boolean> {
  const passwordHash = await hashPassword(password);
  const students: string[] = [];
  for (const s of DEMO_STUDENTS) {
    const created = await createUser({ email: s.email, displayName: s.displayName, role: "maker", passwordHash });
    if (!created) await db().update(users).set({ passwordHash, displayName: s.displayName, role: "maker" }).where(eq(users.email, s.email));
    students.push(created?.id ?? (await userId(s.email)));
  }
  const exists = await db().select({ id: classes.id }).from(classes).where(and(eq(classes.createdBy, instructorId), eq(classes.name, CLASS_NAME))).limit(1);
  if (exists[0]) return false;
  const lanternSrc = byKey["lantern-strap"];
  const inspectionSrc = byKey["inspection-floating"];
  const pressedSrc = byKey["lantern-pressed"];
  const floatingSrc = byKey["lantern-floating"];
  if (!lanternSrc || !inspectionSrc || !pressedSrc || !floatingSrc) throw new Error("the demo builds the class uses are missing");
  const lantern = await copyOf(lanternSrc, instructorId, "Teaching copy: square lantern", "The square lantern as the class meets it: driver strapped to the case with copper tape.");
  const inspection = await copyOf(inspectionSrc, instructorId, "Teaching copy: inspection lamp", "The inspection lamp with its driver floating in the tube.");

  const cls = await createClass({ name: CLASS_NAME, term: "Autumn 2026, Thursday evenings", createdBy: instructorId, joinCode: newJoinCode() });
  for (const id of students) await addMember({ classId: cls.id, userId: id, role: "student" });

  const rev = async (buildId: string) => (await getRevision({ buildId, number: 1 }))!;
  const lanternRev = await rev(lantern);
  const inspectionRev = await rev(inspection);
  await createExample({ classId: cls.id, title: "Why the lantern's junction runs hot", narrative: NARRATIVE_LANTERN, buildId: lantern, revisionId: lanternRev.id, revisionNumber: 1, scenarioId: null, hidden: [], tolerancePercent: 2, revealAt: null, visibility: "class", linkTokenHash: null, createdBy: instructorId });
  await createExample({
    classId: cls.id,
    title: "Your turn: the inspection lamp's driver",
    narrative: NARRATIVE_INSPECTION,
    buildId: inspection,
    revisionId: inspectionRev.id,
    revisionNumber: 1,
    scenarioId: null,
    hidden: ["heat:driver-loss", "node:junction", "limit:junction"],
    tolerancePercent: 3,
    revealAt: new Date(Date.now() + 14 * DAY),
    visibility: "class",
    linkTokenHash: null,
    createdBy: instructorId,
  });

  const now = Date.now();
  const dueAt = new Date(now - 2 * DAY);
  const exerciseId = await createExercise({
    classId: cls.id,
    title: "Cool the lantern's driver",
    instructions: "Start from the teaching copy of the square lantern. Change **one** thing about how the driver is cooled so that the driver board keeps at least 10 K of headroom, save, and hand in. Say in the revision note what you changed and why.",
    starterBuildId: lantern,
    starterRevision: 1,
    dueAt,
    createdBy: instructorId,
  });
  const [wren, jory] = students as [string, string];
  const wrenCopy = await copyOf(pressedSrc, wren, "Cool the lantern's driver — my copy", "Driver ground plane pressed to the case wall through a gap pad.");
  const joryCopy = await copyOf(floatingSrc, jory, "Cool the lantern's driver — my copy", "Driver left floating free inside the box.");
  await putCopy({ exerciseId, userId: wren, buildId: wrenCopy });
  await putCopy({ exerciseId, userId: jory, buildId: joryCopy });
  const onTime = await createHandin({ exerciseId, studentId: wren, buildId: wrenCopy, revisionNumber: 1, late: false, submittedAt: new Date(now - 3 * DAY) });
  await createHandin({ exerciseId, studentId: jory, buildId: joryCopy, revisionNumber: 1, late: true, submittedAt: new Date(now - DAY) });
  await setFeedback({
    id: onTime,
    feedback: "Good choice: with the ground plane pressed to the wall the driver's heat crosses one gap pad into the steel case instead of the air in the box. Look at the driver board's headroom in high mode next — and check the junction, which did not move.",
    mark: "8/10",
    by: instructorId,
    notify: { userId: wren, text: "Feedback from Ines Corrow on your hand-in: Cool the lantern's driver", href: `/classes/${cls.id}/exercises/${exerciseId}` },
  });
  return true;
}
