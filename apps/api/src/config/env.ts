import { z } from 'zod';

/**
 * The process environment, parsed once at boot. A missing or malformed variable stops
 * the process with a message naming it, instead of failing later inside a request.
 */
const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: z.coerce.number().int().positive().default(3000),
  /** Loopback by default: a reverse proxy or a person on this machine reaches it. */
  HOST: z.string().default('127.0.0.1'),
  DATABASE_URL: z.url({ message: 'set DATABASE_URL to a postgres:// URL' }),
  JWT_SECRET: z
    .string({ error: 'set JWT_SECRET to at least 32 random characters' })
    .min(32, { message: 'set JWT_SECRET to at least 32 random characters' }),
  PUBLIC_URL: z.url({ message: 'set PUBLIC_URL to the address people open, like http://127.0.0.1:3000' }),
  S3_ENDPOINT: z.url({ message: 'set S3_ENDPOINT to the S3 server, like http://127.0.0.1:4569' }),
  S3_ACCESS_KEY: z.string({ error: 'set S3_ACCESS_KEY (S3RVER for the local S3 fake)' }).min(1),
  S3_SECRET_KEY: z.string({ error: 'set S3_SECRET_KEY (S3RVER for the local S3 fake)' }).min(1),
  S3_BUCKET: z.string({ error: 'set S3_BUCKET to the bucket name, like porestack' }).min(3),
  S3_REGION: z.string().default('us-east-1'),
  SMTP_URL: z.url({ message: 'set SMTP_URL to the mail server, like smtp://127.0.0.1:1025' }),
  MAIL_FROM: z.string().default('Porestack <no-reply@porestack.test>'),
  /** bcrypt work factor; 12 unless set. Never below 10. */
  BCRYPT_COST: z.coerce.number().int().min(10).max(15).default(12),
  /** Failed sign-ins allowed per account (e-mail) within the window, then 429 until it ends. */
  SIGN_IN_RATE_LIMIT: z.coerce.number().int().positive().default(10),
  /** Failed sign-ins allowed per client address within the window, whatever the accounts. */
  SIGN_IN_CLIENT_RATE_LIMIT: z.coerce.number().int().positive().default(20),
  SIGN_IN_RATE_WINDOW_MINUTES: z.coerce.number().int().positive().default(15),
  SESSION_DAYS: z.coerce.number().int().positive().default(7),
  /** Password-reset requests per e-mail address, and per client address, per hour. */
  RESET_RATE_LIMIT: z.coerce.number().int().positive().default(5),
  RESET_CLIENT_RATE_LIMIT: z.coerce.number().int().positive().default(20),
  /** Sign-ups per client address per hour. */
  SIGN_UP_CLIENT_RATE_LIMIT: z.coerce.number().int().positive().default(20),
  /**
   * Express's `trust proxy`: which proxies' X-Forwarded-For to believe for the client's
   * address (e.g. "loopback" behind a local reverse proxy, or its address). Unset: none.
   */
  TRUST_PROXY: z.string().optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
  /** Largest readings file one upload may be, in MB (the upload is refused with 413 above it). */
  IMPORT_MAX_FILE_MB: z.coerce.number().positive().default(40),
  /** Most rows of readings one file may hold. */
  IMPORT_MAX_ROWS: z.coerce.number().int().positive().default(500_000),
  /** The Chromium that prints reports to PDF (Debian's package, installed by infra/lib.sh). */
  CHROMIUM_PATH: z.string().default('/usr/bin/chromium'),
  /**
   * Seconds a file's parse may take, plus 4 s per MB (a tenth and 0.5 s per MB for a
   * preview, which reads only the first rows); a parse past it is stopped as unreadable.
   */
  IMPORT_PARSE_SECONDS: z.coerce.number().positive().default(20),
  /** Folder of the built web app served in production. */
  WEB_DIST: z.string().optional(),
  /** API processes sharing the port (node:cluster); each has its own pool and parse threads. */
  API_PROCESSES: z.coerce.number().int().min(1).max(16).default(1),
  /**
   * MB of reads each API process keeps until the database notices a change (db/read-cache.ts: the
   * tests list, a test's detail); 0 reads everything from the database every time.
   */
  READ_CACHE_MB: z.coerce.number().min(0).default(64),
});
export type Env = z.infer<typeof EnvSchema>;

function formatIssues(error: z.ZodError): string {
  return error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`).join('\n');
}

let cached: Env | undefined;

/** The parsed environment; exits the process with a clear message when it is invalid. */
export function env(): Env {
  if (cached) return cached;
  const result = EnvSchema.safeParse(process.env);
  if (!result.success) {
    process.stderr.write(`Porestack API: the environment is incomplete:\n${formatIssues(result.error)}\n`);
    process.exit(1);
  }
  cached = result.data;
  return cached;
}

/** Only the database URL: what the TypeORM CLI needs to run migrations. */
export function databaseUrl(): string {
  const result = EnvSchema.shape.DATABASE_URL.safeParse(process.env['DATABASE_URL']);
  if (!result.success) {
    process.stderr.write('Porestack API: set DATABASE_URL to a postgres:// URL.\n');
    process.exit(1);
  }
  return result.data;
}
