import { randomBytes, randomUUID } from 'node:crypto';
import type { Express } from 'express';
import request from 'supertest';
import { createApp } from '../app';
import type { SessionResponse } from '../auth/auth-dto';
import { parseConfig, type AppConfig } from '../config/config';
import { createDatabase, type DatabaseHandle } from '../db/database';
import { migrate } from '../db/migrate';
import type { CapturedMailStore } from '../mail/fake-smtp-server';

// Shared by the API test files. Every file gets its own app and pool on the one test database;
// users carry unique e-mails, so files can run in parallel.

export function testDatabaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set; the API tests need PostgreSQL');
  return url;
}

let migrated: Promise<void> | undefined;

/** Migrates once per test process (idempotent, under the advisory lock) and opens a pool. */
export async function openTestDatabase(): Promise<DatabaseHandle> {
  migrated ??= migrate(testDatabaseUrl());
  await migrated;
  // Four connections per file keep parallel files well under PostgreSQL's 100-connection default.
  return createDatabase(testDatabaseUrl(), 4);
}

export function testConfig(overrides: Partial<AppConfig> = {}): AppConfig {
  const base = parseConfig({
    NODE_ENV: 'test',
    DATABASE_URL: testDatabaseUrl(),
    JWT_SECRET: randomBytes(32).toString('hex'),
    APP_URL: 'http://couplet.test',
    LOG_LEVEL: 'silent',
  });
  return {
    ...base,
    // Generous limits, so only the rate-limit test meets them.
    rateLimits: {
      signIn: { windowMs: 60_000, limit: 1000 },
      forgotPassword: { windowMs: 60_000, limit: 1000 },
    },
    ...overrides,
  };
}

export interface TestApp {
  app: Express;
  config: AppConfig;
  database: DatabaseHandle;
  close(): Promise<void>;
}

export async function createTestApp(
  overrides: Partial<AppConfig> = {},
  capturedMail?: CapturedMailStore,
): Promise<TestApp> {
  const database = await openTestDatabase();
  const config = testConfig(overrides);
  const { app } = createApp({ config, db: database.db, capturedMail });
  return { app, config, database, close: () => database.close() };
}

export function uniqueEmail(label: string): string {
  return `${label}-${randomUUID().slice(0, 8)}@test.example`;
}

export const testPassword = 'correct horse battery';

export interface TestUser {
  id: string;
  email: string;
  displayName: string;
  accessToken: string;
  /** `couplet_refresh=…` as sent back in a Cookie header. */
  refreshCookie: string;
}

export function refreshCookieOf(res: request.Response): string {
  const header = res.headers['set-cookie'] as unknown as string[] | undefined;
  const cookie = (header ?? []).find((c) => c.startsWith('couplet_refresh='));
  if (!cookie) throw new Error('no couplet_refresh cookie in the response');
  return cookie.split(';')[0]!;
}

export async function signUp(app: Express, label: string): Promise<TestUser> {
  const email = uniqueEmail(label);
  const displayName = `Test ${label}`;
  const res = await request(app)
    .post('/api/v1/auth/sign-up')
    .send({ email, password: testPassword, displayName });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${res.text}`);
  const body = res.body as SessionResponse;
  return {
    id: body.user.id,
    email,
    displayName,
    accessToken: body.accessToken,
    refreshCookie: refreshCookieOf(res),
  };
}

export function bearer(user: { accessToken: string }): string {
  return `Bearer ${user.accessToken}`;
}
