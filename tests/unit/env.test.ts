import { describe, expect, it } from 'vitest';
import { EnvError, parseEnv } from '@/lib/env';

const good = {
  DATABASE_URL: 'mysql://probity:pw@127.0.0.1:3307/probity',
  NEXTAUTH_SECRET: 'a'.repeat(40),
  NEXTAUTH_URL: 'http://127.0.0.1:3000',
};

function problems(env: Record<string, string | undefined>): string[] {
  try {
    parseEnv(env);
  } catch (e) {
    if (e instanceof EnvError) return e.problems;
    throw e;
  }
  return [];
}

describe('env module', () => {
  it('accepts a good environment and fills defaults', () => {
    const env = parseEnv(good);
    expect(env.SMTP_PORT).toBe(2525);
    expect(env.SMTP_HOST).toBe('127.0.0.1');
    expect(env.SESSION_MAX_AGE_HOURS).toBe(8);
    expect(env.INVITATION_TTL_HOURS).toBe(72);
  });

  it('coerces numbers from strings', () => {
    expect(parseEnv({ ...good, SMTP_PORT: '2625' }).SMTP_PORT).toBe(2625);
  });

  it('refuses a missing database address, naming it', () => {
    expect(problems({ ...good, DATABASE_URL: undefined })).toEqual([expect.stringMatching(/^DATABASE_URL: /)]);
  });

  it('refuses a non-MariaDB URL and one without a database', () => {
    expect(problems({ ...good, DATABASE_URL: 'postgres://x@127.0.0.1/db' })[0]).toContain('must start with mysql://');
    expect(problems({ ...good, DATABASE_URL: 'mysql://x@127.0.0.1:3307' })[0]).toContain('must name a database');
  });

  it('refuses a short secret and a bad port, listing both', () => {
    const p = problems({ ...good, NEXTAUTH_SECRET: 'short', SMTP_PORT: '70000' });
    expect(p).toHaveLength(2);
    expect(p.join('\n')).toMatch(/NEXTAUTH_SECRET: must be at least 32 characters/);
    expect(p.join('\n')).toMatch(/SMTP_PORT: must be 1–65535/);
  });

  it('refuses a non-numeric session length and a bad NODE_ENV', () => {
    const p = problems({ ...good, SESSION_MAX_AGE_HOURS: 'eight', NODE_ENV: 'staging' });
    expect(p.some((x) => x.startsWith('SESSION_MAX_AGE_HOURS'))).toBe(true);
    expect(p.some((x) => x.startsWith('NODE_ENV'))).toBe(true);
  });

  it('treats empty strings as unset', () => {
    expect(parseEnv({ ...good, SMTP_HOST: '' }).SMTP_HOST).toBe('127.0.0.1');
    expect(problems({ ...good, NEXTAUTH_URL: '' })[0]).toMatch(/^NEXTAUTH_URL/);
  });

  it('the error message lists every problem for the operator', () => {
    expect(() => parseEnv({})).toThrow(/Probity cannot start: bad environment\.\n {2}- DATABASE_URL/);
  });
});
