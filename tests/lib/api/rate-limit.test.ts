import { describe, expect, it } from 'vitest';
import { calcRateFromEnv, DEFAULT_CALC_RATE, RateLimiter } from '../../../src/lib/api/rate-limit';

function clock(start = 0) {
  let now = start;
  return { now: () => now, advance: (ms: number) => (now += ms) };
}

describe('RateLimiter', () => {
  it('lets a client send its burst at once, then refuses with the wait until the next token', () => {
    const c = clock();
    const limiter = new RateLimiter({ perMinute: 60, burst: 3, now: c.now });
    expect([1, 2, 3].map(() => limiter.take('10.0.0.5').allowed)).toEqual([true, true, true]);
    const refused = limiter.take('10.0.0.5');
    expect(refused.allowed).toBe(false);
    // 60 per minute = one token per second; the bucket is empty, so the wait is 1 s.
    expect(refused.retryAfterSeconds).toBeCloseTo(1, 9);
  });

  it('refills at the sustained rate and never above the burst', () => {
    const c = clock();
    const limiter = new RateLimiter({ perMinute: 120, burst: 2, now: c.now });
    limiter.take('a');
    limiter.take('a');
    expect(limiter.take('a').allowed).toBe(false);
    c.advance(500); // 120/min = 2/s: half a second gives one token
    expect(limiter.take('a').allowed).toBe(true);
    expect(limiter.take('a').allowed).toBe(false);
    c.advance(60_000);
    expect(limiter.take('a').remaining).toBe(1); // full bucket of 2, one taken
  });

  it('keeps one bucket per client', () => {
    const limiter = new RateLimiter({ perMinute: 1, burst: 1, now: clock().now });
    expect(limiter.take('a').allowed).toBe(true);
    expect(limiter.take('a').allowed).toBe(false);
    expect(limiter.take('b').allowed).toBe(true);
  });

  it('sweeps idle buckets without forgetting a client that is still waiting', () => {
    const c = clock();
    const limiter = new RateLimiter({ perMinute: 60, burst: 2, now: c.now });
    limiter.take('busy');
    limiter.take('busy'); // empty: needs 2 s to refill
    for (let i = 0; i < 9_999; i++) limiter.take(`idle-${i}`); // one token left each: full after 1 s
    expect(limiter.clients).toBe(10_000);
    c.advance(1_500);
    limiter.take('newcomer'); // the 10 001st client triggers the sweep
    expect(limiter.clients).toBe(2);
    // 'busy' has 1.5 tokens, not a fresh bucket of 2: one more request, then a refusal.
    expect(limiter.take('busy').allowed).toBe(true);
    expect(limiter.take('busy').allowed).toBe(false);
  });

  it('refuses limits that cannot work', () => {
    expect(() => new RateLimiter({ perMinute: 0, burst: 5 })).toThrow(RangeError);
    expect(() => new RateLimiter({ perMinute: 10, burst: 0 })).toThrow(RangeError);
  });
});

describe('calcRateFromEnv', () => {
  it('uses 600 per minute with bursts of 120 when nothing is set', () => {
    expect(calcRateFromEnv({})).toEqual({ perMinute: 600, burst: 120 });
    expect(DEFAULT_CALC_RATE).toEqual({ perMinute: 600, burst: 120 });
  });

  it('reads positive numbers from the environment and ignores anything else', () => {
    expect(calcRateFromEnv({ LOOPWRIGHT_CALC_RATE_PER_MIN: '30', LOOPWRIGHT_CALC_BURST: '4' })).toEqual({ perMinute: 30, burst: 4 });
    expect(calcRateFromEnv({ LOOPWRIGHT_CALC_RATE_PER_MIN: '-3', LOOPWRIGHT_CALC_BURST: 'lots' })).toEqual({ perMinute: 600, burst: 120 });
  });
});
