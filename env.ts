/**
 * The app's configuration, read once from the environment and checked. Nothing else reads
 * process.env directly. Parsed lazily so `next build` runs without a database or secrets.
 */
import { z } from "zod";

const bool = z
  .enum(["0", "1", "true", "false", ""])
  .optional()
  .transform((v) => v === "1" || v === "true");

const schema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.string().url().default("postgres://tankwright@127.0.0.1:54329/tankwright"),
  DATABASE_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
  NEXTAUTH_SECRET: z.string().min(16).optional(),
  APP_URL: z.string().url().default("http://localhost:3000"),
  /** next-auth's name for the public address; when set it wins over APP_URL for sign-in cookies. */
  NEXTAUTH_URL: z.string().url().optional(),
  /**
   * How many reverse proxies in front of the app append to X-Forwarded-For. 0 trusts none of the
   * header's entries beyond the one the app server itself adds for the connection.
   */
  TRUSTED_PROXY_HOPS: z.coerce.number().int().min(0).max(5).default(0),
  /** Wrong sign-ins allowed per account, and per address, before a pause (see server/sign-in-throttle.ts). */
  SIGN_IN_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(5),
  SIGN_IN_LIMIT_PER_ADDRESS: z.coerce.number().int().min(1).default(30),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().default(1025),
  SMTP_SECURE: bool,
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().default("Tankwright <no-reply@tankwright.test>"),
  /** The local mail catcher's HTTP API; set only in development and tests. */
  MAIL_CATCHER_URL: z.string().url().optional(),
  S3_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().default("us-east-1"),
  S3_BUCKET: z.string().default("tankwright"),
  S3_ACCESS_KEY_ID: z.string().default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().default("S3RVER"),
  S3_FORCE_PATH_STYLE: bool,
  /**
   * The card payment service's API address. Unset outside production: the local fake on
   * 127.0.0.1:4566 that `npm start` runs; unset in production: the SDK's own service.
   */
  PAYMENTS_API_URL: z.string().url().optional(),
  /** The payment service's secret API key; required in production. */
  PAYMENTS_SECRET_KEY: z.string().min(8).optional(),
  /** The secret the payment service signs webhooks with; required in production. */
  PAYMENTS_WEBHOOK_SECRET: z.string().min(8).optional(),
  /** Seconds a stage-change or shared-note e-mail waits in the outbox when the company has not set its own. */
  NOTICE_DELAY_SECONDS: z.coerce.number().int().min(0).max(3600).default(120),
  /** Turns on development-only pages (the caught-mail viewer). Never set in production. */
  TANKWRIGHT_DEV_TOOLS: bool,
  /**
   * Adds a Server-Timing header to signed-in API answers: the session check, each board query, the
   * gates and the JSON. Only the benchmark sets it; off in production.
   */
  BENCH_TIMING: bool,
});

export type Env = z.infer<typeof schema>;

let cached: Env | null = null;

export function env(): Env {
  if (cached) return cached;
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
    throw new Error(`Tankwright's configuration is invalid:\n${lines}`);
  }
  cached = parsed.data;
  return cached;
}

/** The address people reach the app at; HTTPS here turns on Secure cookies and HSTS. */
export function publicUrl(): string {
  const e = env();
  return e.NEXTAUTH_URL ?? e.APP_URL;
}

export const servedOverHttps = () => publicUrl().startsWith("https://");

/** The secret that signs session tokens: required in production, a fixed dev value otherwise. */
export function authSecret(): string {
  const e = env();
  if (e.NEXTAUTH_SECRET) return e.NEXTAUTH_SECRET;
  if (e.NODE_ENV === "production") {
    throw new Error("NEXTAUTH_SECRET must be set in production (at least 16 characters; the same on every app instance).");
  }
  return "tankwright-development-secret-not-for-production";
}

/** Where and how the app reaches the card payment service; local fake defaults outside production. */
export function paymentsConfig(): { apiUrl: string | null; secretKey: string; webhookSecret: string } {
  const e = env();
  const prod = e.NODE_ENV === "production";
  if (prod && !e.PAYMENTS_API_URL && (!e.PAYMENTS_SECRET_KEY || !e.PAYMENTS_WEBHOOK_SECRET)) {
    throw new Error("PAYMENTS_SECRET_KEY and PAYMENTS_WEBHOOK_SECRET must be set in production.");
  }
  return {
    apiUrl: e.PAYMENTS_API_URL ?? (prod ? null : "http://127.0.0.1:4566"),
    secretKey: e.PAYMENTS_SECRET_KEY ?? "sk_test_tankwright_local_fake",
    webhookSecret: e.PAYMENTS_WEBHOOK_SECRET ?? "whsec_tankwright_local_fake",
  };
}
