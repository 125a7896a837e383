import { isIP } from 'node:net';
import { z } from 'zod';

/**
 * The development-only session secret. Handy for `npm start` on a laptop; a production
 * start refuses it, because anyone who reads this file could forge session cookies with it.
 */
export const DEVELOPMENT_SESSION_SECRET = 'quietlayer-development-secret-do-not-use-in-production';

const booleanFromString = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'], { error: 'must be true or false' })
  .transform((value) => value === 'true' || value === '1' || value === 'yes');

/** Express's "trust proxy" value: off, every hop, the first n hops, or these addresses/subnets. */
export type TrustProxy = boolean | number | string[];

/** Names proxy-addr (Express's "trust proxy") understands as address ranges. */
const TRUST_PROXY_NAMES = new Set(['loopback', 'linklocal', 'uniquelocal']);
const MAX_TRUST_PROXY_HOPS = 10;

/** True for an IPv4 dotted mask whose one-bits are contiguous (255.255.255.0, not 255.0.255.0). */
function isContiguousMask(mask: string): boolean {
  const bits = mask
    .split('.')
    .map((part) => Number(part).toString(2).padStart(8, '0'))
    .join('');
  return /^1*0*$/.test(bits);
}

function isTrustedProxyEntry(entry: string): boolean {
  if (TRUST_PROXY_NAMES.has(entry)) return true;
  const [address, range, extra] = entry.split('/');
  if (extra !== undefined) return false;
  const family = isIP(address);
  if (family === 0) return false;
  if (range === undefined) return true;
  if (/^\d{1,3}$/.test(range)) return Number(range) <= (family === 4 ? 32 : 128);
  return family === 4 && isIP(range) === 4 && isContiguousMask(range);
}

const TRUST_PROXY_HELP =
  `TRUST_PROXY must be false, true, a hop count (0–${MAX_TRUST_PROXY_HOPS}) or a comma-separated list of proxy ` +
  'addresses/subnets (e.g. loopback, 10.0.0.0/8, 203.0.113.7)';

/**
 * Parses TRUST_PROXY the way Express reads its "trust proxy" setting: 'false' (default: the socket
 * address is the client), 'true' (trust every X-Forwarded-For hop; only when no client can reach the
 * server except through the proxy), a hop count, or addresses/subnets of the proxies.
 */
const trustProxySchema = z
  .string()
  .default('false')
  .transform((text, ctx): TrustProxy => {
    const value = text.trim();
    if (value === 'false') return false;
    if (value === 'true') return true;
    if (/^\d+$/.test(value)) {
      const hops = Number(value);
      if (hops <= MAX_TRUST_PROXY_HOPS) return hops;
      ctx.addIssue({ code: 'custom', message: `TRUST_PROXY hop count must be at most ${MAX_TRUST_PROXY_HOPS} (got ${value})` });
      return z.NEVER;
    }
    const entries = value.split(',').map((entry) => entry.trim());
    const bad = entries.filter((entry) => !isTrustedProxyEntry(entry));
    if (bad.length > 0) {
      ctx.addIssue({ code: 'custom', message: `${TRUST_PROXY_HELP}; not an address or subnet: ${bad.map((b) => JSON.stringify(b)).join(', ')}` });
      return z.NEVER;
    }
    return entries;
  });

const rawEnvSchema = z.object({
  DATABASE_URL: z
    .string({ error: 'DATABASE_URL is required (e.g. postgres://postgres@127.0.0.1:54329/quietlayer)' })
    .min(1, 'DATABASE_URL is required')
    .refine((value) => /^postgres(ql)?:\/\//.test(value), 'DATABASE_URL must start with postgres:// or postgresql://'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65_535, 'PORT must be at most 65535').default(3000),
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  QUIETLAYER_MODE: z.enum(['demo', 'production']).optional(),
  SESSION_SECRET: z.string().optional(),
  PUBLIC_URL: z.url({ error: 'PUBLIC_URL must be an absolute URL such as https://quietlayer.example' }).optional(),
  SMTP_URL: z.string().optional(),
  SMTP_FAKE_PORT: z.coerce.number().int().min(0).max(65_535).default(2525),
  MAIL_FROM: z.string().min(3).default('QuietLayer <no-reply@larkspur.example>'),
  COOKIE_SECURE: booleanFromString.default(false),
  TRUST_PROXY: trustProxySchema,
  BCRYPT_COST: z.coerce.number().int().min(4, 'BCRYPT_COST must be at least 4').max(15, 'BCRYPT_COST must be at most 15').default(12),
  SESSION_TTL_SECONDS: z.coerce.number().int().min(60, 'SESSION_TTL_SECONDS must be at least 60').max(7 * 24 * 3600).default(28_800),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  PGPORT: z.coerce.number().int().min(1).max(65_535).default(54_329),
  PGDATA_DIR: z.string().min(1).default('.data/postgres'),
});

export type Env = Omit<z.infer<typeof rawEnvSchema>, 'QUIETLAYER_MODE' | 'SESSION_SECRET' | 'PUBLIC_URL' | 'SMTP_URL'> & {
  QUIETLAYER_MODE: 'demo' | 'production';
  SESSION_SECRET: string;
  /** Base URL put in e-mailed links, without a trailing slash. */
  PUBLIC_URL: string;
  SMTP_URL: string | undefined;
};

export class EnvError extends Error {
  constructor(public readonly problems: string[]) {
    super(`QuietLayer cannot start, the environment is not valid:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
    this.name = 'EnvError';
  }
}

/**
 * Parse and check the environment once at boot. Empty strings count as unset, so
 * `SMTP_URL=` in a .env file means "use the local fake".
 *
 * Production (NODE_ENV=production or QUIETLAYER_MODE=production) refuses the built-in
 * development session secret, any secret shorter than 32 characters, and a bcrypt cost below 12.
 */
export function loadEnv(source: Record<string, string | undefined> = process.env): Env {
  const cleaned = Object.fromEntries(Object.entries(source).filter(([, value]) => value !== undefined && value !== ''));
  const parsed = rawEnvSchema.safeParse(cleaned);
  if (!parsed.success) {
    throw new EnvError(parsed.error.issues.map((issue) => `${issue.path.join('.') || 'environment'}: ${issue.message}`));
  }
  const raw = parsed.data;
  const mode = raw.QUIETLAYER_MODE ?? (raw.NODE_ENV === 'production' ? 'production' : 'demo');
  const production = raw.NODE_ENV === 'production' || mode === 'production';
  const problems: string[] = [];

  const sessionSecret = raw.SESSION_SECRET ?? DEVELOPMENT_SESSION_SECRET;
  if (sessionSecret.length < 32) {
    problems.push(`SESSION_SECRET must be at least 32 characters (got ${sessionSecret.length})`);
  }
  if (production && sessionSecret === DEVELOPMENT_SESSION_SECRET) {
    problems.push(
      'SESSION_SECRET is unset or the built-in development secret; a production start needs its own secret of at least 32 random characters (e.g. `openssl rand -base64 48`)',
    );
  }
  if (production && raw.BCRYPT_COST < 12) {
    problems.push(`BCRYPT_COST must be at least 12 in production (got ${raw.BCRYPT_COST})`);
  }
  if (problems.length > 0) throw new EnvError(problems);

  return {
    ...raw,
    QUIETLAYER_MODE: mode,
    SESSION_SECRET: sessionSecret,
    PUBLIC_URL: (raw.PUBLIC_URL ?? `http://${raw.HOST}:${raw.PORT}`).replace(/\/+$/, ''),
    SMTP_URL: raw.SMTP_URL,
  };
}
