import { z } from 'zod';
import { isKnownTimeZone } from '../../shared/schemas/dates';

const logLevelSchema = z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']);

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  /** Loopback by default: the demo's sign-ins are public, so exposing it on a network is a choice. */
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(1).max(65_535).default(3000),
  DATABASE_URL: z.string().url('DATABASE_URL must be a postgres:// URL'),
  SESSION_SECRET: z.string().min(16, 'SESSION_SECRET must be at least 16 characters'),
  /** Mark the session cookie Secure (set when served behind HTTPS). */
  COOKIE_SECURE: z
    .enum(['true', 'false'])
    .optional()
    .transform((v) => (v === undefined ? undefined : v === 'true')),
  /** Reverse-proxy hops to trust for client address and https (X-Forwarded-*); 0 when served directly. */
  TRUST_PROXY: z.coerce.number().int().min(0).max(10).default(0),
  LOG_LEVEL: logLevelSchema.default('info'),
  /** Failed sign-ins allowed per account per window. */
  SIGNIN_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
  /** Failed sign-ins allowed per client address per window (a whole plant may share one address). */
  SIGNIN_ADDRESS_LIMIT: z.coerce.number().int().min(1).default(100),
  SIGNIN_RATE_WINDOW_MS: z.coerce.number().int().min(1000).default(15 * 60 * 1000),
  CLIENT_DIST: z.string().optional(),
  /** Folder that holds uploaded photos and signatures (relative to the working directory unless absolute). */
  UPLOAD_DIR: z.string().min(1).default('.data/uploads'),
  /** Largest single photo accepted, in bytes (15 MiB by default: a full-resolution tablet photo fits). */
  UPLOAD_MAX_BYTES: z.coerce.number().int().min(1024).max(100 * 1024 * 1024).default(15 * 1024 * 1024),
  /** Who the visit reports come from (report header, e-mail sender name). */
  COMPANY_NAME: z.string().trim().min(2).max(120).default('Ridgeline Press Service (invented demo company)'),
  /** Where customers reach this server: the start of the signed report links in e-mails. */
  PUBLIC_BASE_URL: z.string().url('PUBLIC_BASE_URL must be a URL such as https://service.example.com').default('http://127.0.0.1:3000').transform((u) => u.replace(/\/+$/, '')),
  SMTP_HOST: z.string().min(1).default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65_535).default(1025),
  /** true: TLS from the first byte (port 465); false: plain, upgraded with STARTTLS when the server offers it. */
  SMTP_SECURE: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().min(3).default('Crankwise reports <reports@crankwise.invalid>'),
  /** Key for the customers' signed report links; by default derived from SESSION_SECRET. */
  REPORT_LINK_SECRET: z.string().min(32, 'REPORT_LINK_SECRET must be at least 32 characters').optional(),
  REPORT_LINK_DAYS: z.coerce.number().int().min(1).max(366).default(30),
  /** Time zone for dates printed in reports and e-mails (IANA name such as America/Chicago). */
  REPORT_TIME_ZONE: z
    .string()
    .default('UTC')
    .refine(isKnownTimeZone, 'REPORT_TIME_ZONE must be an IANA time zone such as America/Chicago or UTC'),
  /** How often the outbox worker looks for e-mails due to be sent, in milliseconds. */
  OUTBOX_POLL_MS: z.coerce.number().int().min(200).max(3_600_000).default(5000),
});

export type Env = z.infer<typeof envSchema>;

/**
 * The log level before `createApp` applies the validated config: the logger exists from the first
 * import, when nothing is parsed yet. The same schema reads LOG_LEVEL; tests default to silent.
 */
export function startupLogLevel(source: NodeJS.ProcessEnv = process.env): z.infer<typeof logLevelSchema> {
  const given = logLevelSchema.safeParse(source.LOG_LEVEL);
  if (given.success) return given.data;
  return source.NODE_ENV === 'test' ? 'silent' : 'info';
}

/** Parses the environment once; a bad value stops the process with every problem named. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  return parsed.data;
}
