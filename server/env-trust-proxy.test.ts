import { describe, expect, it } from 'vitest';
import { loadEnv } from './env';

const base = { DATABASE_URL: 'postgres://postgres@127.0.0.1:54329/quietlayer' };
const trustProxy = (value: string | undefined) => loadEnv({ ...base, TRUST_PROXY: value }).TRUST_PROXY;

describe('TRUST_PROXY', () => {
  it('is off by default (unset or empty): the socket address is the client', () => {
    expect(trustProxy(undefined)).toBe(false);
    expect(trustProxy('')).toBe(false);
    expect(trustProxy('false')).toBe(false);
  });

  it("accepts 'true' (every hop) and a hop count, kept as a number so Express counts hops", () => {
    expect(trustProxy('true')).toBe(true);
    expect(trustProxy('1')).toBe(1);
    expect(trustProxy('0')).toBe(0);
    expect(trustProxy(' 2 ')).toBe(2);
  });

  it('accepts a comma-separated list of addresses, subnets and the named ranges', () => {
    expect(trustProxy('loopback')).toEqual(['loopback']);
    expect(trustProxy('10.0.0.0/8, 203.0.113.7,::1, fd00::/8')).toEqual(['10.0.0.0/8', '203.0.113.7', '::1', 'fd00::/8']);
    expect(trustProxy('loopback,linklocal,uniquelocal,192.168.0.0/255.255.0.0')).toEqual([
      'loopback',
      'linklocal',
      'uniquelocal',
      '192.168.0.0/255.255.0.0',
    ]);
  });

  it('refuses anything else with a message naming TRUST_PROXY and the bad entry', () => {
    expect(() => trustProxy('yes')).toThrow(/TRUST_PROXY must be false, true, a hop count.*"yes"/);
    expect(() => trustProxy('TRUE')).toThrow(/TRUST_PROXY.*"TRUE"/);
    expect(() => trustProxy('10.0.0.0/33')).toThrow(/TRUST_PROXY.*"10\.0\.0\.0\/33"/);
    expect(() => trustProxy('::1/129')).toThrow(/TRUST_PROXY.*"::1\/129"/);
    expect(() => trustProxy('10.0.0.0/255.0.255.0')).toThrow(/TRUST_PROXY/);
    expect(() => trustProxy('10.0.0.1,')).toThrow(/TRUST_PROXY.*""/);
    expect(() => trustProxy('proxy.example')).toThrow(/TRUST_PROXY.*"proxy\.example"/);
    expect(() => trustProxy('-1')).toThrow(/TRUST_PROXY/);
  });

  it('refuses a hop count above the limit, naming the limit', () => {
    expect(trustProxy('10')).toBe(10);
    expect(() => trustProxy('11')).toThrow(/TRUST_PROXY hop count must be at most 10 \(got 11\)/);
  });
});
