import { describe, expect, it } from 'vitest';
import { describeDbError, isDatabaseUnavailable } from './db-errors';

describe('describeDbError: one log line for a database error', () => {
  it('names the driver code and errno found down the cause chain', () => {
    const driver = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:3307'), { code: 'ECONNREFUSED', errno: -111 });
    const wrapped = new Error('Failed query: select 1\nparams: ', { cause: driver });
    expect(describeDbError(wrapped)).toBe('ECONNREFUSED -111');
    expect(isDatabaseUnavailable(wrapped)).toBe(true);
  });

  it('keeps a code-less message (a rollback on a lost connection) on one line', () => {
    const error = new Error('Failed query: rollback\nparams: ');
    expect(describeDbError(error)).toBe('Failed query: rollback');
  });
});
