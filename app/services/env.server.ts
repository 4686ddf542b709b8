import { z } from "zod";

const schema = z
  .object({
    NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
    DATABASE_URL: z.string().regex(/^(mariadb|mysql):\/\//, "must be a mariadb:// URL"),
    DATABASE_REPLICA_URLS: z
      .string()
      .regex(/^\s*(mariadb|mysql):\/\/[^,]+(,\s*(mariadb|mysql):\/\/[^,]+)*\s*$/, "must be mariadb:// URLs separated by commas")
      .optional(),
    SESSION_SECRET: z.string().min(16, "must be at least 16 characters").optional(),
    APP_URL: z.string().url().default("http://127.0.0.1:3000"),
    SMTP_URL: z
      .string()
      .regex(/^smtps?:\/\//, "must be an smtp:// or smtps:// URL")
      .optional(),
    MAIL_FROM: z.string().default("Tankside <no-reply@tankside.example>"),
    // Set only when the local fake SMTP server writes its messages there (development, tests).
    MAIL_OUTBOX_DIR: z.string().optional(),
    S3_ENDPOINT: z.string().url().optional(),
    S3_BUCKET: z.string().default("tankside-photos"),
    S3_REGION: z.string().default("us-east-1"),
    S3_ACCESS_KEY_ID: z.string().default("S3RVER"),
    S3_SECRET_ACCESS_KEY: z.string().default("S3RVER"),
    SHOW_DEMO_SIGNINS: z.enum(["0", "1"]).optional(),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV === "production" && !env.SESSION_SECRET) {
      ctx.addIssue({ code: "custom", path: ["SESSION_SECRET"], message: "is required in production" });
    }
  });

export type Env = z.infer<typeof schema>;

let cached: Env | undefined;

/** Environment, validated once; a bad variable stops the process with its name. */
export function env(): Env {
  if (!cached) {
    const parsed = schema.safeParse(process.env);
    if (!parsed.success) {
      const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
      throw new Error(`Invalid environment:\n${lines.join("\n")}`);
    }
    cached = parsed.data;
  }
  return cached;
}

export const isProduction = () => env().NODE_ENV === "production";

/** Sections that exist only in some set-ups: the outbox only while mail goes to the local fake server. */
export const hiddenSections = (): string[] => (env().MAIL_OUTBOX_DIR ? [] : ["/admin/outbox"]);
