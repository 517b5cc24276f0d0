/** How many analysis workers the page starts for the cores the browser reports (the rule in spawn.ts; common practice, no source). */
import { describe, expect, it } from 'vitest';
import { workerCount } from './spawn';

describe('workerCount', () => {
  it('leaves one core to the page and starts one to two workers', () => {
    expect(workerCount(undefined)).toBe(1);
    expect(workerCount(1)).toBe(1);
    expect(workerCount(2)).toBe(1);
    expect(workerCount(3)).toBe(2);
    expect(workerCount(16)).toBe(2);
  });
});
