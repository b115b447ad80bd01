// Reads what the fake SMTP server (maildev) actually received, through its web API.
import type { Client, Reply } from "./http";
const INBOX = process.env.MAIL_INBOX_URL ?? "http://127.0.0.1:1081";

type Received = { id: string; subject: string; text?: string; to: { address: string }[] };

export async function waitForMail(to: string, subjectIncludes: string, timeoutMs = 10_000): Promise<Received> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const response = await fetch(`${INBOX}/api/email`);
    const mails = (await response.json()) as Received[];
    const hit = mails.find(
      (m) => m.to.some((t) => t.address.toLowerCase() === to.toLowerCase()) && m.subject.includes(subjectIncludes),
    );
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${to} about "${subjectIncludes}" within ${timeoutMs} ms`);
}

let signups = 0;

/**
 * Signs up the way a person does: the sign-up answer (202, the same for every address), the
 * mailed link, then the link's button. Returns the last answer (201 with the user when the
 * account was made). Each sign-up comes from its own documentation address (RFC 5737) so a
 * test suite's many sign-ups do not share one client allowance.
 */
export async function signUp(client: Client, body: { email: string; password: string; displayName: string }): Promise<Reply> {
  const from = `198.51.100.${(signups++ % 250) + 1}`;
  const asked = await client.request("POST", "/api/v1/auth/signup", body, { "x-forwarded-for": from });
  if (asked.status !== 202) return asked;
  const mail = await waitForMail(body.email, "Finish making your Sinkwise account");
  const token = /\/signup\/finish\/([A-Za-z0-9_-]+)/.exec(mail.text ?? "")?.[1];
  if (!token) throw new Error(`no sign-up link in the mail to ${body.email}`);
  return client.post("/api/v1/auth/signup-confirm", { token });
}
