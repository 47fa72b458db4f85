import { describe, expect, it } from 'vitest';
import { errorForLog } from './logger.js';

describe('errorForLog', () => {
  it('masks e-mail addresses in message and stack', () => {
    const logged = errorForLog(new Error("insert into users (email) values ('ada@larchloaf.example') failed"));
    expect(logged.message).toBe("insert into users (email) values ('[email]') failed");
    expect(String(logged.stack)).not.toContain('ada@larchloaf.example');
    expect(logged.type).toBe('Error');
  });

  it('accepts non-Error values', () => {
    expect(errorForLog('plain text').message).toBe('plain text');
  });
});
