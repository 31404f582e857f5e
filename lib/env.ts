// The server's environment, validated once; a missing value names itself instead of failing later.
import { z } from "@/lib/validation/zod";

const schema = z.object({
  DATABASE_URL: z.string().url(),
  APP_URL: z.string().url().default("http://127.0.0.1:3000"),
  BETTER_AUTH_SECRET: z.string().min(32, "BETTER_AUTH_SECRET must be at least 32 characters"),
  S3_ENDPOINT: z.string().url().optional(),
  S3_BUCKET: z.string().min(1).default("tearline-photos"),
  S3_REGION: z.string().default("us-east-1"),
  S3_ACCESS_KEY_ID: z.string().default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().default("S3RVER"),
  S3_FORCE_PATH_STYLE: z.string().optional(),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(2525),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().default("Tearline <casebook@tearline.local>"),
  MAIL_FAKE_URL: z.string().url().optional(),
});

export type Env = z.infer<typeof schema>;
let cached: Env | undefined;

export function env(): Env {
  if (cached) return cached;
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Tearline's environment is incomplete (${problems}). Start it through the README's commands.`);
  }
  cached = parsed.data;
  return cached;
}
