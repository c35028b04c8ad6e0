import { z } from 'zod';

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
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  SIGNIN_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
  SIGNIN_RATE_WINDOW_MS: z.coerce.number().int().min(1000).default(15 * 60 * 1000),
  CLIENT_DIST: z.string().optional(),
  /** Folder that holds uploaded photos and signatures (relative to the working directory unless absolute). */
  UPLOAD_DIR: z.string().min(1).default('.data/uploads'),
  /** Largest single photo accepted, in bytes (15 MiB by default: a full-resolution tablet photo fits). */
  UPLOAD_MAX_BYTES: z.coerce.number().int().min(1024).max(100 * 1024 * 1024).default(15 * 1024 * 1024),
});

export type Env = z.infer<typeof envSchema>;

/** Parses the environment once; a bad value stops the process with every problem named. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  return parsed.data;
}
