import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from '../src/config/env';

const base = { DB_PATH: '/tmp/gp-config-spec/db.sqlite', JWT_SECRET: 'a-secret-of-enough-length' };

describe('HOST, the listening address', () => {
  it('defaults to this machine only', () => {
    expect(loadConfig({ ...base }).host).toBe('127.0.0.1');
  });

  it('takes every network, an IPv6 address or a host name', () => {
    expect(loadConfig({ ...base, HOST: '0.0.0.0' }).host).toBe('0.0.0.0');
    expect(loadConfig({ ...base, HOST: '::' }).host).toBe('::');
    expect(loadConfig({ ...base, HOST: 'dock-pc.local' }).host).toBe('dock-pc.local');
  });

  it('refuses anything else, naming the setting', () => {
    expect(() => loadConfig({ ...base, HOST: 'http://0.0.0.0' })).toThrow(ConfigError);
    expect(() => loadConfig({ ...base, HOST: 'two words' })).toThrow(/HOST must be an IP address/);
  });
});
