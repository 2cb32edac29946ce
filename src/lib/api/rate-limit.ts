/**
 * A token bucket per client: each client may send `burst` requests at once, refilled at
 * `perMinute` per minute. Kept in memory (one server process); idle full buckets are dropped.
 */
export interface RateLimitOptions {
  /** Sustained requests per minute per client. */
  perMinute: number;
  /** Bucket size: requests a client may send at once. */
  burst: number;
  /** Clock in ms (tests pass their own). */
  now?: () => number;
}

export interface RateDecision {
  allowed: boolean;
  /** Seconds until one request will be allowed again (0 when allowed). */
  retryAfterSeconds: number;
  /** Whole requests left in the bucket after this one. */
  remaining: number;
}

interface Bucket {
  tokens: number;
  updatedAt: number;
}

/** Buckets kept before idle ones are swept. */
const SWEEP_AT = 10_000;

export class RateLimiter {
  private readonly buckets = new Map<string, Bucket>();
  private readonly perMs: number;
  private readonly now: () => number;

  constructor(readonly options: RateLimitOptions) {
    if (!(options.perMinute > 0) || !(options.burst >= 1)) {
      throw new RangeError('A rate limit needs perMinute > 0 and burst >= 1.');
    }
    this.perMs = options.perMinute / 60_000;
    this.now = options.now ?? Date.now;
  }

  /** Clients with a bucket in memory. */
  get clients(): number {
    return this.buckets.size;
  }

  /** Takes one token for `client` if there is one. */
  take(client: string): RateDecision {
    const now = this.now();
    const bucket = this.refilled(client, now);
    if (bucket.tokens >= 1) {
      bucket.tokens -= 1;
      return { allowed: true, retryAfterSeconds: 0, remaining: Math.floor(bucket.tokens) };
    }
    return { allowed: false, retryAfterSeconds: (1 - bucket.tokens) / this.perMs / 1000, remaining: 0 };
  }

  private refilled(client: string, now: number): Bucket {
    let bucket = this.buckets.get(client);
    if (!bucket) {
      if (this.buckets.size >= SWEEP_AT) this.sweep(now);
      bucket = { tokens: this.options.burst, updatedAt: now };
      this.buckets.set(client, bucket);
      return bucket;
    }
    const elapsed = Math.max(0, now - bucket.updatedAt);
    bucket.tokens = Math.min(this.options.burst, bucket.tokens + elapsed * this.perMs);
    bucket.updatedAt = now;
    return bucket;
  }

  /** Drops buckets that would be full by now: forgetting them changes nothing. */
  private sweep(now: number): void {
    for (const [client, bucket] of this.buckets) {
      if (bucket.tokens + (now - bucket.updatedAt) * this.perMs >= this.options.burst) this.buckets.delete(client);
    }
  }
}

/** Defaults: well above what the calculators send (a slider drag is debounced to a few per second). */
export const DEFAULT_CALC_RATE = { perMinute: 600, burst: 120 } as const;

/**
 * The calculation routes' limits, from LOOPWRIGHT_CALC_RATE_PER_MIN and LOOPWRIGHT_CALC_BURST
 * when set to positive numbers, else the defaults.
 */
export function calcRateFromEnv(env: Record<string, string | undefined> = process.env): RateLimitOptions {
  const perMinute = positive(env.LOOPWRIGHT_CALC_RATE_PER_MIN) ?? DEFAULT_CALC_RATE.perMinute;
  const burst = positive(env.LOOPWRIGHT_CALC_BURST) ?? DEFAULT_CALC_RATE.burst;
  return { perMinute, burst: Math.max(1, Math.floor(burst)) };
}

function positive(text: string | undefined): number | null {
  const value = Number(text);
  return text !== undefined && text.trim() !== '' && Number.isFinite(value) && value > 0 ? value : null;
}
