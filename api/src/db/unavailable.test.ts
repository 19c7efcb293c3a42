import { describe, expect, it } from 'vitest';
import { isDatabaseUnavailable } from './unavailable.js';

// SQLSTATE codes from the PostgreSQL manual, Appendix A (class 08 connection exception, 57P0x
// operator intervention); the node-postgres messages as that library words them.
describe('isDatabaseUnavailable', () => {
  it('knows the server going away or refusing connections', () => {
    for (const code of ['57P01', '57P02', '57P03', '08006', '08001', 'ECONNREFUSED', 'ECONNRESET']) {
      expect(isDatabaseUnavailable(Object.assign(new Error('x'), { code })), code).toBe(true);
    }
    expect(isDatabaseUnavailable(new Error('Connection terminated unexpectedly'))).toBe(true);
    expect(isDatabaseUnavailable(new Error('timeout exceeded when trying to connect'))).toBe(true);
    const refused = new AggregateError([Object.assign(new Error('connect'), { code: 'ECONNREFUSED' })], '');
    expect(isDatabaseUnavailable(refused)).toBe(true);
    expect(isDatabaseUnavailable(new Error('wrapped', { cause: Object.assign(new Error(), { code: '57P01' }) }))).toBe(
      true,
    );
  });

  it('leaves real errors alone: constraint violations, syntax, programming mistakes', () => {
    for (const code of ['23505', '23503', '42601', '40P01', '22P02']) {
      expect(isDatabaseUnavailable(Object.assign(new Error('x'), { code })), code).toBe(false);
    }
    expect(isDatabaseUnavailable(new TypeError('cannot read properties of undefined'))).toBe(false);
    expect(isDatabaseUnavailable(undefined)).toBe(false);
  });
});
