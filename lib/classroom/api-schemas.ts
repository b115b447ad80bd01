import { z } from "zod";

/** Inputs of the Classroom routes: the one definition of each (types are inferred). */

const name = z
  .string({ error: "Enter the class name." })
  .trim()
  .min(1, { error: "Enter the class name." })
  .max(120, { error: "Use at most 120 characters for the class name." });
const term = z.string({ error: "Term must be text." }).trim().max(80, { error: "Use at most 80 characters for the term." });

export const createClassSchema = z.object({ name, term: term.default("") });
export type CreateClassInput = z.infer<typeof createClassSchema>;

export const patchClassSchema = z
  .object({
    name: name.optional(),
    term: term.optional(),
    archived: z.boolean({ error: "Archived must be true or false." }).optional(),
    rotateJoinCode: z.literal(true, { error: "Rotate join code must be true when given." }).optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { error: "Give something to change: name, term, archived or a new join code." });

const inviteEmail = z.string({ error: "Each invitation needs an e-mail address." }).trim().toLowerCase().max(254, { error: "An e-mail address is at most 254 characters." });
export const invitationsSchema = z.object({
  emails: z.array(inviteEmail, { error: "List the e-mail addresses to invite." }).min(1, { error: "List at least one e-mail address to invite." }).max(50, { error: "Invite at most 50 addresses at a time." }),
});

/** The e-mail check of invitation lists: the message names the address that does not read. */
export const EMAIL_PATTERN = z.email();

export const JOIN_CODE_PATTERN = /^[A-Z0-9]{8}$/;
export const INVITE_TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

export const joinSchema = z.union(
  [
    z.object({ code: z.string({ error: "Enter the join code." }).trim().toUpperCase().min(1, { error: "Enter the join code." }).max(40, { error: "A join code is 8 letters and digits." }) }),
    z.object({
      token: z.string({ error: "The invitation link is missing its token." }).min(1).max(100),
      // An invitation to an address without an account: the account is made on the way in.
      displayName: z.string({ error: "Enter your name." }).trim().min(1, { error: "Enter your name." }).max(120, { error: "Use at most 120 characters for the name." }).optional(),
      password: z.string({ error: "Choose a password." }).min(10, { error: "Use at least 10 characters for the password." }).max(200, { error: "Use at most 200 characters for the password." }).optional(),
    }),
  ],
  { error: "Give a join code or an invitation token." },
);

const title = (what: string) =>
  z
    .string({ error: `Enter the ${what} title.` })
    .trim()
    .min(1, { error: `Enter the ${what} title.` })
    .max(160, { error: `Use at most 160 characters for the ${what} title.` });
const markdown = (label: string) => z.string({ error: `${label} must be text.` }).max(20000, { error: `${label} is limited to 20,000 characters.` });

export const EXAMPLE_VISIBILITY_LABELS = { class: "the class", link: "anyone with the link" } as const;

export const hiddenValueKey = z.string().min(1).max(120);

export const createExampleSchema = z.object({
  title: title("example"),
  narrative: markdown("The narrative").default(""),
  buildId: z.string({ error: "Choose the build the example works through." }).min(1, { error: "Choose the build the example works through." }).max(40),
  revision: z.number({ error: "Revision must be a number." }).int().positive().optional(),
  scenarioId: z.string().max(80).optional(),
  hidden: z.array(hiddenValueKey).max(60, { error: "Hide at most 60 values." }).default([]),
  tolerancePercent: z.number({ error: "Tolerance must be a number (per cent)." }).min(0.1, { error: "Tolerance is at least 0.1 %." }).max(50, { error: "Tolerance is at most 50 %." }).default(2),
  revealAt: z.iso.datetime({ offset: true, error: "Reveal date must be a date and time." }).nullable().optional(),
  visibility: z.enum(["class", "link"], { error: "Visibility is the class or anyone with the link." }).default("class"),
});

export const patchExampleSchema = z
  .object({
    title: title("example").optional(),
    narrative: markdown("The narrative").optional(),
    hidden: z.array(hiddenValueKey).max(60, { error: "Hide at most 60 values." }).optional(),
    tolerancePercent: z.number({ error: "Tolerance must be a number (per cent)." }).min(0.1, { error: "Tolerance is at least 0.1 %." }).max(50, { error: "Tolerance is at most 50 %." }).optional(),
    revealAt: z.iso.datetime({ offset: true, error: "Reveal date must be a date and time." }).nullable().optional(),
    reveal: z.boolean({ error: "Reveal must be true or false." }).optional(),
    visibility: z.enum(["class", "link"], { error: "Visibility is the class or anyone with the link." }).optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { error: "Give something to change." });

export const answerSchema = z.object({
  key: hiddenValueKey,
  value: z.number({ error: "Your answer must be a number." }).refine(Number.isFinite, { error: "Your answer must be a number." }),
});

export const createExerciseSchema = z.object({
  title: title("exercise"),
  instructions: markdown("The instructions").default(""),
  buildId: z.string({ error: "Choose the starter build." }).min(1, { error: "Choose the starter build." }).max(40),
  revision: z.number({ error: "Revision must be a number." }).int().positive().optional(),
  dueAt: z.iso.datetime({ offset: true, error: "Due date must be a date and time." }),
});

export const handinSchema = z.object({
  buildId: z.string({ error: "Choose the build to hand in." }).min(1, { error: "Choose the build to hand in." }).max(40),
  revision: z.number({ error: "Revision must be a number." }).int().positive().optional(),
});

export const feedbackSchema = z.object({
  feedback: z.string({ error: "Write the feedback." }).trim().min(1, { error: "Write the feedback." }).max(8000, { error: "Feedback is limited to 8,000 characters." }),
  mark: z.string({ error: "Mark must be text." }).trim().max(40, { error: "Use at most 40 characters for the mark." }).optional(),
});
