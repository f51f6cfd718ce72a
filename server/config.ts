/**
 * Every setting the server reads, from the environment, in one place.
 * Defaults suit a developer's machine; production must set SESSION_SECRET.
 */
import path from 'node:path';

const root = path.resolve(__dirname, '..');

function int(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value)) throw new Error(`${name} must be a whole number, got "${raw}"`);
  return value;
}

function bool(name: string, fallback: boolean): boolean {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  return raw === '1' || raw.toLowerCase() === 'true';
}

const production = process.env.NODE_ENV === 'production';

export const config = {
  root,
  production,
  host: process.env.HOST || '127.0.0.1',
  port: int('PORT', 3000),
  /** Base URL used in e-mailed links. */
  publicUrl: process.env.PUBLIC_URL || `http://127.0.0.1:${int('PORT', 3000)}`,
  db: {
    host: process.env.DB_HOST || '127.0.0.1',
    port: int('DB_PORT', 3307),
    user: process.env.DB_USER || 'pinwright',
    password: process.env.DB_PASSWORD ?? 'pinwright-local',
    name: process.env.DB_NAME || 'pinwright',
    /** Project-local server's data directory (used by the start and test commands). */
    dataDir: path.resolve(root, process.env.PINWRIGHT_DB_DIR || '.data/mariadb'),
  },
  session: {
    secret: process.env.SESSION_SECRET || (production ? '' : 'pinwright-development-secret-change-me'),
    maxAgeDays: int('SESSION_MAX_AGE_DAYS', 14),
  },
  /** Set to the number of proxies in front (or "true") when served behind HTTPS. */
  trustProxy: process.env.TRUST_PROXY || '',
  cookieSecure: bool('COOKIE_SECURE', production),
  bcryptCost: int('BCRYPT_COST', 12),
  /** Days after a completed level check when the bow is due again (shared/level-status.ts). */
  levelCheckMaxAgeDays: int('LEVEL_CHECK_MAX_AGE_DAYS', 90),
  uploadDir: path.resolve(root, process.env.UPLOAD_DIR || '.data/uploads'),
  webDir: path.resolve(root, process.env.WEB_DIR || 'dist'),
  smtp: {
    host: process.env.SMTP_HOST || '127.0.0.1',
    port: int('SMTP_PORT', 2525),
    user: process.env.SMTP_USER || '',
    password: process.env.SMTP_PASSWORD || '',
    from: process.env.MAIL_FROM || 'Pinwright <no-reply@pinwright.invalid>',
    /** SMTPS on connect (port 465); otherwise STARTTLS when the server offers it. */
    secure: bool('SMTP_SECURE', false),
    /** Start the local fake SMTP service (server/mail/fake-smtp.ts); default: in development when no SMTP_HOST is set. */
    fake: bool('FAKE_SMTP', !production && !process.env.SMTP_HOST),
  },
  /** Where the fake SMTP service stores received messages (one JSON file each). */
  mailDir: path.resolve(root, process.env.MAIL_DIR || '.data/mail'),
  /** The development mail reader (GET /api/dev/mail); never in production. */
  devMail: !production,
  /** Rate limits (server/middleware/rate-limits.ts): how many requests per window, counted in this process. */
  limits: {
    /** Failed sign-ins from one client address, whatever the e-mail (password spraying), per 15 minutes. */
    signInFailuresPerAddress: int('SIGN_IN_FAILURES_PER_ADDRESS', 20),
    /** Sign-in attempts from one address for one e-mail, per 15 minutes. */
    signInPerAddressAndEmail: int('SIGN_IN_PER_ADDRESS_AND_EMAIL', 10),
    /** Failed sign-ins for one e-mail, from any address (guessing spread over many addresses), per 15 minutes. */
    signInFailuresPerEmail: int('SIGN_IN_FAILURES_PER_EMAIL', 30),
    /** New accounts from one address, per hour, over every route that creates one (sign-up, invitation acceptance). */
    signUpsPerAddress: int('SIGN_UPS_PER_ADDRESS', 30),
    /** Invitations sent by one account, per hour. */
    invitesPerAccount: int('INVITES_PER_ACCOUNT', 20),
  },
};

export type Config = typeof config;
