import { describe, expect, test } from 'vitest';
import { DEFAULT_SESSION_SECRET, loadConfig } from '../../server/config.ts';

describe('loadConfig', () => {
  test('when NODE_ENV is production and no session secret is set, then it refuses to start', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(/SESSION_SECRET must be set in production/);
    expect(() => loadConfig({ NODE_ENV: 'production', SESSION_SECRET: DEFAULT_SESSION_SECRET })).toThrow(/SESSION_SECRET/);
  });

  test('when production has its own secret, or development runs without one, then it loads', () => {
    expect(loadConfig({ NODE_ENV: 'production', SESSION_SECRET: 'a-real-secret-of-enough-length' }).sessionSecret).toBe(
      'a-real-secret-of-enough-length',
    );
    expect(loadConfig({ NODE_ENV: 'development' }).sessionSecret).toBe(DEFAULT_SESSION_SECRET);
  });
});
