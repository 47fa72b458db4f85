import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ConfigError, configFromEnv } from './config.js';

describe('configFromEnv', () => {
  it('uses safe local defaults', () => {
    const config = configFromEnv({ NODE_ENV: 'test' });
    expect(config.port).toBe(3000);
    expect(config.publicUrl).toBe('http://localhost:3000');
    expect(config.secureCookies).toBe(false);
    expect(config.google.authorizationUrl).toBe('http://localhost:3001/authorize');
    expect(config.mail.transport).toBe('capture');
    expect(config.databaseFile.endsWith(join('data', 'demandscape.sqlite'))).toBe(true);
  });

  it('lists every bad variable in one error', () => {
    let error: unknown;
    try {
      configFromEnv({ PORT: 'eighty', PUBLIC_URL: 'not a url', RATE_LIMIT_AUTH_PER_MINUTE: '0', NODE_ENV: 'staging' });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ConfigError);
    const problems = (error as ConfigError).problems.map((p) => p.variable).sort();
    expect(problems).toEqual(['NODE_ENV', 'PORT', 'PUBLIC_URL', 'RATE_LIMIT_AUTH_PER_MINUTE']);
    expect((error as Error).message).toContain('PORT: must be a whole number between 1 and 65535');
  });

  it('derives the default public URL from PORT', () => {
    expect(configFromEnv({ NODE_ENV: 'test', PORT: '8080' }).publicUrl).toBe('http://localhost:8080');
  });

  it('rejects a port out of range', () => {
    expect(() => configFromEnv({ PORT: '70000' })).toThrow(/PORT: must be a whole number between 1 and 65535/);
  });

  it('requires SESSION_SECRET in production', () => {
    expect(() => configFromEnv({ NODE_ENV: 'production' })).toThrow(/SESSION_SECRET: is required when NODE_ENV=production/);
  });

  it('generates and keeps a development session secret under DATA_DIR', () => {
    const dir = mkdtempSync(join(tmpdir(), 'ds-config-'));
    const first = configFromEnv({ NODE_ENV: 'development', DATA_DIR: dir });
    const second = configFromEnv({ NODE_ENV: 'development', DATA_DIR: dir });
    expect(first.sessionSecret).toHaveLength(64);
    expect(second.sessionSecret).toBe(first.sessionSecret);
    expect(readFileSync(join(dir, 'session-secret'), 'utf8').trim()).toBe(first.sessionSecret);
  });

  it('marks cookies secure behind an https public URL and disables unset Google in production', () => {
    const config = configFromEnv({ NODE_ENV: 'production', SESSION_SECRET: 'x'.repeat(40), PUBLIC_URL: 'https://demandscape.example/' });
    expect(config.secureCookies).toBe(true);
    expect(config.publicUrl).toBe('https://demandscape.example');
    expect(config.google.enabled).toBe(false);
    expect(config.startStandIns).toBe(false);
  });
});
