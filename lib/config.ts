import { z } from "zod";

// Every setting comes from the environment; README.md lists them all. Parsed lazily so that
// `next build` needs none of them.
const schema = z.object({
  CORDARIUM_ENV: z.enum(["development", "demo", "test", "production"]).default("development"),
  DATABASE_URL: z.string().url(),
  DATABASE_POOL_SIZE: z.coerce.number().int().min(1).max(200).default(10),

  S3_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().default("us-east-1"),
  S3_BUCKET: z.string().min(3),
  S3_ACCESS_KEY_ID: z.string().min(1),
  S3_SECRET_ACCESS_KEY: z.string().min(1),
  S3_FORCE_PATH_STYLE: z.enum(["true", "false"]).default("true").transform((v) => v === "true"),

  MEILI_HOST: z.string().url(),
  MEILI_API_KEY: z.string().optional(),
  SEARCH_INDEX_PREFIX: z.string().regex(/^[a-z0-9_-]*$/).default("cordarium_"),

  SMTP_URL: z.string().url(),
  MAIL_FROM: z.string().min(3).default("Cordarium <archive@cordarium.test>"),
  // Only set for the local mail fake: enables the development mailbox page.
  MAIL_FAKE_API_URL: z.string().url().optional(),

  NEXTAUTH_URL: z.string().url().optional(),
  NEXTAUTH_SECRET: z.string().min(16),

  // How far approximate (~) and uncertain (?) dates are widened for date-overlap queries, in years.
  DATING_APPROXIMATE_MARGIN_YEARS: z.coerce.number().int().min(0).max(100).default(5),
  DATING_UNCERTAIN_MARGIN_YEARS: z.coerce.number().int().min(0).max(100).default(5),

  // Uploads: the largest file and the most pixels an image may decode to (a guard against decompression bombs).
  IMAGE_MAX_BYTES: z.coerce.number().int().min(1024).default(300 * 1024 * 1024),
  IMAGE_MAX_PIXELS: z.coerce.number().int().min(1_000_000).default(250_000_000),
  // Perceptual-hash distance (of 64 bits) at or below which an upload is flagged as a likely other photograph.
  IMAGE_NEAR_DUPLICATE_DISTANCE: z.coerce.number().int().min(0).max(32).default(10),
  // "off" keeps this instance from processing queued jobs (e.g. a web-only instance).
  CORDARIUM_WORKER: z.enum(["on", "off"]).default("on"),

  SIGN_IN_MAX_FAILURES_PER_ACCOUNT: z.coerce.number().int().min(1).default(5),
  SIGN_IN_MAX_FAILURES_PER_ADDRESS: z.coerce.number().int().min(1).default(30),
});

export type Config = z.infer<typeof schema>;

let cached: Config | undefined;

export function config(): Config {
  if (!cached) {
    const parsed = schema.safeParse(process.env);
    if (!parsed.success) {
      const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
      throw new Error(`Cordarium configuration is invalid:\n${lines.join("\n")}`);
    }
    cached = parsed.data;
  }
  return cached;
}

/** The public base URL of the app, for links in e-mails. */
export function appUrl(): string {
  return (config().NEXTAUTH_URL ?? `http://localhost:${process.env.PORT ?? 3000}`).replace(/\/$/, "");
}

export function datingMargins() {
  return {
    approximateMarginYears: config().DATING_APPROXIMATE_MARGIN_YEARS,
    uncertainMarginYears: config().DATING_UNCERTAIN_MARGIN_YEARS,
  };
}
