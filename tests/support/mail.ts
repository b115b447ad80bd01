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

/**
 * Signs up the way a person does: the sign-up answer (202, the same for every address), the
 * mailed link, then the link's button. Returns the last answer (201 with the user when the
 * account was made), or the refusal of a bad sign-up. Each sign-up comes from its own random
 * private address, so a suite's many sign-ups (in many test files) never share one client's
 * hourly allowance.
 */
export async function signUp(client: Client, body: { email: string; password: string; displayName: string }): Promise<Reply> {
  const octet = () => Math.floor(Math.random() * 254) + 1;
  const from = `10.${octet()}.${octet()}.${octet()}`;
  const asked = await client.request("POST", "/api/v1/auth/signup", body, { "x-forwarded-for": from });
  if (asked.status === 429) throw new Error(`sign-up refused by the rate limit: ${JSON.stringify(asked.body)}`);
  if (asked.status !== 202) return asked;
  const mail = await waitForMail(body.email, "Finish making your Sinkwise account");
  const token = /\/signup\/finish\/([A-Za-z0-9_-]+)/.exec(mail.text ?? "")?.[1];
  if (!token) throw new Error(`no sign-up link in the mail to ${body.email}`);
  return client.post("/api/v1/auth/signup-confirm", { token });
}
