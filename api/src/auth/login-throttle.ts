import { HttpException, HttpStatus, Injectable } from '@nestjs/common';

const WINDOW_MS = 60_000;
const MAX_FAILURES = 5;

/** Failed sign-ins per account and address over the last minute, kept in memory. */
@Injectable()
export class LoginThrottle {
  private readonly failures = new Map<string, number[]>();

  check(key: string, now = Date.now()): void {
    const recent = this.recent(key, now);
    if (recent.length >= MAX_FAILURES) {
      const retryAfter = Math.ceil(((recent[0] ?? now) + WINDOW_MS - now) / 1000);
      throw new HttpException(
        {
          statusCode: HttpStatus.TOO_MANY_REQUESTS,
          error: 'Too Many Requests',
          message: `Too many failed sign-ins; try again in ${retryAfter} s`,
          retryAfter,
        },
        HttpStatus.TOO_MANY_REQUESTS,
      );
    }
  }

  fail(key: string, now = Date.now()): void {
    this.failures.set(key, [...this.recent(key, now), now]);
    // Attackers choose the keys: drop stale ones before the map can grow without bound.
    if (this.failures.size > 10_000) {
      for (const known of this.failures.keys()) {
        if (this.recent(known, now).length === 0) this.failures.delete(known);
      }
    }
  }

  succeed(key: string): void {
    this.failures.delete(key);
  }

  private recent(key: string, now: number): number[] {
    return (this.failures.get(key) ?? []).filter((at) => now - at < WINDOW_MS);
  }
}
