// Reads what the fake SMTP server (maildev) actually received, through its web API.
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
