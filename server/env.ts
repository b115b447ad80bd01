import { z } from "zod";

/** Every environment variable the server reads, parsed once. See .env.example. */
const envSchema = z.object({
  DATABASE_HOST: z.string().default("127.0.0.1"),
  DATABASE_PORT: z.coerce.number().int().positive().default(3307),
  DATABASE_NAME: z.string().min(1).default("sinkwise"),
  DATABASE_USER: z.string().min(1).default("sinkwise"),
  DATABASE_PASSWORD: z.string().default(""),
  APP_URL: z.url().default("http://127.0.0.1:3000"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(1025),
  SMTP_SECURE: z.enum(["true", "false"]).default("false").transform((v) => v === "true"),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default("Sinkwise <no-reply@sinkwise.local>"),
  MAIL_INBOX_URL: z.string().optional(),
  S3_ENDPOINT: z.string().optional(),
  S3_REGION: z.string().default("us-east-1"),
  S3_BUCKET: z.string().default("sinkwise-attachments"),
  S3_ACCESS_KEY_ID: z.string().default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().default("S3RVER"),
  /**
   * Addresses of reverse proxies whose X-Forwarded-For and X-Forwarded-Host we believe
   * (comma-separated IPs). Empty: the client address is the socket's and headers are ignored.
   */
  TRUSTED_PROXY: z
    .string()
    .default("")
    .transform((text) => text.split(",").map((a) => a.trim()).filter(Boolean))
    .pipe(z.array(z.union([z.ipv4(), z.ipv6()], { error: "TRUSTED_PROXY: list IP addresses, separated by commas" }))),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

/** Parses process.env on first use (not at import, so `next build` needs no database). */
export function env(): Env {
  cached ??= envSchema.parse(process.env);
  return cached;
}
