import { randomBytes } from 'node:crypto';
import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { ConfigService } from '@nestjs/config';
import type { Env } from './env.validation.js';

/** The project root: api/src/config or api/dist/config, three levels up. */
export const PROJECT_ROOT = path.resolve(import.meta.dirname, '..', '..', '..');

const API_PACKAGE = JSON.parse(readFileSync(path.resolve(import.meta.dirname, '..', '..', 'package.json'), 'utf8')) as {
  version: string;
};
export const API_VERSION = API_PACKAGE.version;

/** Typed, resolved settings. Features inject this, never `process.env`. */
export interface AppConfig {
  nodeEnv: Env['NODE_ENV'];
  isProduction: boolean;
  host: string;
  port: number;
  dataDir: string;
  databasePath: string;
  /** Uploaded species photos (DATA_DIR/photos unless PHOTOS_DIR says otherwise). */
  photosDir: string;
  /** A PostgreSQL server's address, or null for the embedded SQLite file at `databasePath`. */
  databaseUrl: string | null;
  webDist: string;
  jwtSecret: string;
  jwtExpiresInSeconds: number;
  /** Accepted for verifying tokens during a secret rotation, never for signing. */
  jwtPreviousSecret: string | null;
  /** Origins allowed to call the API from a browser on another site; empty: none (CORS closed). */
  corsOrigins: string[];
  demoData: boolean;
  loginThrottle: { limit: number; ttlMs: number };
  /** Express's `trust proxy` setting: which forwarding headers to believe (false: none). */
  trustProxy: boolean | number | string[];
  logLevel: Env['LOG_LEVEL'];
  /** Outgoing mail: a real SMTP server, or null to keep mail in the local outbox. */
  smtpUrl: string | null;
  mailFrom: string;
  /** Public address of the web app, without a trailing slash. */
  publicUrl: string;
  /** Folder of the open reference data, read in place (never copied). */
  referenceDir: string;
}

export const APP_CONFIG = Symbol('APP_CONFIG');

function fromRoot(p: string): string {
  return path.isAbsolute(p) ? p : path.resolve(PROJECT_ROOT, p);
}

/** Reads the JWT secret from the environment, or from DATA_DIR/jwt-secret, creating it on first start. */
function resolveJwtSecret(env: Env, dataDir: string): string {
  if (env.JWT_SECRET) return env.JWT_SECRET;
  const file = path.join(dataDir, 'jwt-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  chmodSync(file, 0o600);
  return secret;
}

export function buildAppConfig(config: ConfigService<Env, true>): AppConfig {
  const env = {
    NODE_ENV: config.get('NODE_ENV', { infer: true }),
    HOST: config.get('HOST', { infer: true }),
    PORT: config.get('PORT', { infer: true }),
    DATA_DIR: config.get('DATA_DIR', { infer: true }),
    DATABASE: config.get('DATABASE', { infer: true }),
    DATABASE_URL: config.get('DATABASE_URL', { infer: true }),
    PHOTOS_DIR: config.get('PHOTOS_DIR', { infer: true }),
    JWT_SECRET: config.get('JWT_SECRET', { infer: true }),
    JWT_EXPIRES_IN_SECONDS: config.get('JWT_EXPIRES_IN_SECONDS', { infer: true }),
    JWT_PREVIOUS_SECRET: config.get('JWT_PREVIOUS_SECRET', { infer: true }),
    CORS_ORIGINS: config.get('CORS_ORIGINS', { infer: true }),
    DEMO_DATA: config.get('DEMO_DATA', { infer: true }),
    WEB_DIST: config.get('WEB_DIST', { infer: true }),
    TRUST_PROXY: config.get('TRUST_PROXY', { infer: true }),
    LOGIN_THROTTLE_LIMIT: config.get('LOGIN_THROTTLE_LIMIT', { infer: true }),
    LOGIN_THROTTLE_TTL_SECONDS: config.get('LOGIN_THROTTLE_TTL_SECONDS', { infer: true }),
    LOG_LEVEL: config.get('LOG_LEVEL', { infer: true }),
    SMTP_URL: config.get('SMTP_URL', { infer: true }),
    MAIL_FROM: config.get('MAIL_FROM', { infer: true }),
    PUBLIC_URL: config.get('PUBLIC_URL', { infer: true }),
    HOMEGROUND_REFERENCE_DIR: config.get('HOMEGROUND_REFERENCE_DIR', { infer: true }),
  } satisfies Env;
  const isProduction = env.NODE_ENV === 'production';
  const dataDir = fromRoot(env.DATA_DIR);
  return {
    nodeEnv: env.NODE_ENV,
    isProduction,
    host: env.HOST,
    port: env.PORT,
    dataDir,
    databasePath: env.DATABASE === ':memory:' ? ':memory:' : fromRoot(env.DATABASE),
    databaseUrl: env.DATABASE_URL ?? null,
    photosDir: env.PHOTOS_DIR ? fromRoot(env.PHOTOS_DIR) : path.join(dataDir, 'photos'),
    webDist: fromRoot(env.WEB_DIST),
    jwtSecret: resolveJwtSecret(env, dataDir),
    jwtExpiresInSeconds: env.JWT_EXPIRES_IN_SECONDS,
    jwtPreviousSecret: env.JWT_PREVIOUS_SECRET ?? null,
    corsOrigins: env.CORS_ORIGINS,
    // Demo sign-ins must never exist in production, whatever the variable says.
    demoData: !isProduction && (env.DEMO_DATA ?? true),
    loginThrottle: { limit: env.LOGIN_THROTTLE_LIMIT, ttlMs: env.LOGIN_THROTTLE_TTL_SECONDS * 1000 },
    trustProxy: env.TRUST_PROXY,
    logLevel: env.LOG_LEVEL,
    smtpUrl: env.SMTP_URL ?? null,
    mailFrom: env.MAIL_FROM,
    publicUrl: env.PUBLIC_URL.replace(/\/+$/, ''),
    referenceDir: env.HOMEGROUND_REFERENCE_DIR
      ? fromRoot(env.HOMEGROUND_REFERENCE_DIR)
      : path.resolve(PROJECT_ROOT, '..', 'shared', 'reference'),
  };
}
