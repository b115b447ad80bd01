import "server-only";
import { eq } from "drizzle-orm";
import { hashPassword } from "@/server/auth/password";
import { db } from "@/db/client";
import { createUser } from "@/db/queries/users";
import { type Role, users } from "@/db/schema";

/** The demo workshop's people: one account per role. */
export const DEMO_ACCOUNTS: readonly { email: string; displayName: string; role: Role; can: string }[] = [
  { email: "maker@sinkwise.test", displayName: "Mara Quayle (workshop volunteer)", role: "maker", can: "builds retrofits, checks their budget, asks for reviews" },
  { email: "reviewer@sinkwise.test", displayName: "Ravi Tamsin (senior tech)", role: "reviewer", can: "reviews builds shared with them and records verdicts" },
  { email: "instructor@sinkwise.test", displayName: "Ines Corrow (evening class)", role: "instructor", can: "runs the class and publishes worked examples" },
  { email: "admin@sinkwise.test", displayName: "Alder Penhale (workshop admin)", role: "admin", can: "manages users and roles, curates the catalogue and records checks of parts against their datasheets" },
];

/** Creates the demo accounts, or resets their role and password when they already exist. */
export async function seedAccounts(password: string): Promise<Record<Role, string>> {
  const passwordHash = await hashPassword(password);
  const ids = {} as Record<Role, string>;
  for (const account of DEMO_ACCOUNTS) {
    const created = await createUser({ email: account.email, displayName: account.displayName, role: account.role, passwordHash });
    if (created) {
      ids[account.role] = created.id;
    } else {
      await db().update(users).set({ role: account.role, passwordHash, displayName: account.displayName }).where(eq(users.email, account.email));
      const row = await db().select({ id: users.id }).from(users).where(eq(users.email, account.email));
      ids[account.role] = row[0]!.id;
    }
  }
  return ids;
}
