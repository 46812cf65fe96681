// A test that logs an unexpected console.error fails: errors must be asserted, not ignored.
import { afterEach, beforeEach, expect, vi } from 'vitest';

let spy: ReturnType<typeof vi.spyOn>;

beforeEach(() => {
  spy = vi.spyOn(console, 'error');
});

afterEach(() => {
  const calls = spy.mock.calls;
  spy.mockRestore();
  expect(calls, 'unexpected console.error').toEqual([]);
});
