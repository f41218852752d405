import { describe, expect, it } from 'vitest';
import { ConfigError, parseConfig } from './config';

const good = {
  DATABASE_URL: 'postgres://app:pw@127.0.0.1:5432/couplet',
  JWT_SECRET: 'ab'.repeat(32),
};

describe('parseConfig', () => {
  it('fills the documented defaults', () => {
    const c = parseConfig(good);
    expect(c).toMatchObject({
      nodeEnv: 'development',
      port: 4300,
      host: '127.0.0.1',
      appUrl: 'http://127.0.0.1:4300',
      mailCapture: false,
      loadDemo: false,
      logLevel: 'info',
    });
  });

  it.each([
    ['a missing DATABASE_URL', { JWT_SECRET: good.JWT_SECRET }, 'DATABASE_URL'],
    ['a short JWT_SECRET', { ...good, JWT_SECRET: 'ab'.repeat(31) }, 'JWT_SECRET'],
    ['a JWT_SECRET that is not hex', { ...good, JWT_SECRET: 'zz'.repeat(32) }, 'JWT_SECRET'],
    ['a PORT that is not a number', { ...good, PORT: 'eighty' }, 'PORT'],
    ['an unknown NODE_ENV', { ...good, NODE_ENV: 'staging' }, 'NODE_ENV'],
    ['a non-postgres DATABASE_URL', { ...good, DATABASE_URL: 'mysql://x/y' }, 'DATABASE_URL'],
    [
      'mail capture in production',
      { ...good, NODE_ENV: 'production', MAIL_CAPTURE: '1', APP_URL: 'https://c.example' },
      'MAIL_CAPTURE',
    ],
    ['production without APP_URL', { ...good, NODE_ENV: 'production' }, 'APP_URL'],
    ['a flag that is not a flag', { ...good, LOAD_DEMO: 'maybe' }, 'LOAD_DEMO'],
  ])('fails loudly on %s, naming the variable', (_name, env, variable) => {
    expect(() => parseConfig(env)).toThrow(ConfigError);
    expect(() => parseConfig(env)).toThrow(variable);
  });

  it('reads flags and SMTP settings', () => {
    const c = parseConfig({
      ...good,
      MAIL_CAPTURE: '1',
      SMTP_PORT: '2526',
      SMTP_SECURE: 'true',
      LOAD_DEMO: 'yes',
    });
    expect(c.mailCapture).toBe(true);
    expect(c.loadDemo).toBe(true);
    expect(c.smtp).toMatchObject({ port: 2526, secure: true });
  });
});
