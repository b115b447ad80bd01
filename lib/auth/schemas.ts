import { z } from "zod";
import { ROLE_NAMES } from "./roles";

const email = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.org." }));

const newPassword = z
  .string({ error: "Choose a password." })
  .min(10, { error: "Use at least 10 characters for the password." })
  .max(200, { error: "Use at most 200 characters for the password." });

export const signUpSchema = z.object({
  email,
  password: newPassword,
  displayName: z
    .string({ error: "Enter your name." })
    .trim()
    .min(1, { error: "Enter your name." })
    .max(120, { error: "Use at most 120 characters for the name." }),
});

export const signInSchema = z.object({
  email,
  password: z.string({ error: "Enter your password." }).min(1, { error: "Enter your password." }).max(200),
});

export const resetRequestSchema = z.object({ email });

export const resetConfirmSchema = z.object({
  token: z.string({ error: "The reset link is missing its token." }).min(10).max(200),
  password: newPassword,
});

export const signupConfirmSchema = z.object({
  token: z.string({ error: "The sign-up link is missing its token." }).min(10, { error: "The sign-up link is incomplete; open it from the mail again." }).max(200, { error: "The sign-up link is not one we sent." }),
});

export const roleChangeSchema = z.object({
  role: z.enum(ROLE_NAMES, { error: `Role must be one of ${ROLE_NAMES.join(", ")}.` }),
});
