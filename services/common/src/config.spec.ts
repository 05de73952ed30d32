import { describe, expect, it } from 'vitest';
import { loadConfig } from './config.js';

describe('configuration for more than one machine', () => {
  it('defaults to the SQLite file and one local calculator', () => {
    const config = loadConfig({}, '/srv/tw');
    expect(config.databaseUrl).toBe('sqlite:/srv/tw/data/tubwright.sqlite');
    expect([config.databasePoolMin, config.databasePoolMax]).toEqual([null, null]);
    expect(config.calculatorCopies).toBe(1);
    expect(config.calculatorPorts).toEqual([4301]);
    expect(config.calculatorUrls).toEqual(['http://127.0.0.1:4301']);
  });

  it('reads DATABASE_URL and the pool bounds, and refuses other schemes and crossed bounds', () => {
    const config = loadConfig({ DATABASE_URL: 'postgres://tw@db.example.test/tw', DATABASE_POOL_MIN: '2', DATABASE_POOL_MAX: '20' }, '/srv/tw');
    expect(config).toMatchObject({ databaseUrl: 'postgres://tw@db.example.test/tw', databasePoolMin: 2, databasePoolMax: 20 });
    expect(() => loadConfig({ DATABASE_URL: 'mysql://tw@db/tw' })).toThrow(/DATABASE_URL/);
    expect(() => loadConfig({ DATABASE_POOL_MIN: '8', DATABASE_POOL_MAX: '4' })).toThrow(/DATABASE_POOL_MIN/);
    expect(() => loadConfig({ DATABASE_POOL_MAX: '0' })).toThrow(/DATABASE_POOL_MAX/);
  });

  it('places extra calculator copies clear of the other default ports', () => {
    const config = loadConfig({ CALCULATOR_COPIES: '3' });
    expect(config.calculatorPorts).toEqual([4301, 4331, 4332]);
    expect(config.calculatorUrls).toEqual(['http://127.0.0.1:4301', 'http://127.0.0.1:4331', 'http://127.0.0.1:4332']);
    expect(() => loadConfig({ CALCULATOR_COPIES: '2', CALCULATOR_PORT: '0' })).toThrow(/CALCULATOR_PORT/);
  });

  it('takes CALCULATOR_URLS as given, trimmed, and refuses what is not http(s)', () => {
    const config = loadConfig({ CALCULATOR_URLS: ' http://10.0.0.5:4301/, http://10.0.0.6:4301 ' });
    expect(config.calculatorUrls).toEqual(['http://10.0.0.5:4301', 'http://10.0.0.6:4301']);
    expect(() => loadConfig({ CALCULATOR_URLS: 'http://10.0.0.5:4301,ftp://x' })).toThrow(/CALCULATOR_URLS/);
    expect(() => loadConfig({ CALCULATOR_URLS: 'not a url' })).toThrow(/CALCULATOR_URLS/);
  });
});
