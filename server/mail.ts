import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/server/env";

const holder = globalThis as unknown as { sinkwiseMailer?: Transporter };

function transport(): Transporter {
  if (!holder.sinkwiseMailer) {
    const e = env();
    holder.sinkwiseMailer = nodemailer.createTransport({
      host: e.SMTP_HOST,
      port: e.SMTP_PORT,
      secure: e.SMTP_SECURE,
      // The local fake speaks plain SMTP; a real provider negotiates STARTTLS.
      ignoreTLS: e.SMTP_HOST === "127.0.0.1" || e.SMTP_HOST === "localhost",
      auth: e.SMTP_USER ? { user: e.SMTP_USER, pass: e.SMTP_PASSWORD ?? "" } : undefined,
    });
  }
  return holder.sinkwiseMailer;
}

export type Mail = { to: string; subject: string; text: string };

export async function sendMail(mail: Mail): Promise<void> {
  await transport().sendMail({ from: env().MAIL_FROM, ...mail });
}
