// Counts failed sign-ins per account and per address in PostgreSQL, so every API process shares the count.
import type pg from 'pg';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';

export interface ThrottleLimits {
  perAccount: number;
  perAddress: number;
  windowSeconds: number;
}

export class SignInThrottle {
  private readonly byAccount: RateLimiterPostgres;
  private readonly byAddress: RateLimiterPostgres;

  constructor(pool: pg.Pool, private readonly limits: ThrottleLimits) {
    const common = { storeClient: pool, storeType: 'pool', tableName: 'sign_in_limits', tableCreated: true, duration: limits.windowSeconds };
    this.byAccount = new RateLimiterPostgres({ ...common, keyPrefix: 'account', points: limits.perAccount });
    this.byAddress = new RateLimiterPostgres({ ...common, keyPrefix: 'address', points: limits.perAddress });
  }

  /** Seconds to wait before another attempt is allowed, or 0 when it may go ahead. */
  async secondsBlocked(account: string, address: string): Promise<number> {
    const [a, b] = await Promise.all([this.byAccount.get(account), this.byAddress.get(address)]);
    const waits = [
      a && a.consumedPoints >= this.limits.perAccount ? a.msBeforeNext : 0,
      b && b.consumedPoints >= this.limits.perAddress ? b.msBeforeNext : 0,
    ];
    return Math.ceil(Math.max(...waits) / 1000);
  }

  async recordFailure(account: string, address: string): Promise<void> {
    await Promise.all([
      this.byAccount.penalty(account, 1),
      this.byAddress.penalty(address, 1),
    ]);
  }

  /** A successful sign-in clears the account's count (the address's count runs out on its own). */
  async recordSuccess(account: string): Promise<void> {
    await this.byAccount.delete(account);
  }
}

export { RateLimiterRes };
