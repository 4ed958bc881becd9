/**
 * The default request work budget admits a bench codebook a base-station panel needs, and still refuses what would
 * hold a pool thread for minutes. Sizes: an 11 × 11 beam codebook (common practice for a ±60° square scan) of a
 * 64 × 64 panel; the per-beam cost behind the unit is measured in shared/compute/pattern-work.ts.
 */
import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/config.ts';
import { patternWork } from '../../shared/compute/pattern-work.ts';

const budget = loadConfig({ NODE_ENV: 'test', DATABASE_URL: 'postgres://x@127.0.0.1:1/x', SESSION_SECRET: 'test-secret-0123456789abcdef' }).REQUEST_WORK_BUDGET;

describe('default work budget', () => {
  it('admits 121 beams of bench codes for a 64×64 panel', () => {
    expect(patternWork({ nx: 64, ny: 64 }, 121)).toBeLessThanOrEqual(budget);
  });
  it('refuses ten times that (a 1,210-beam table of the same panel)', () => {
    expect(patternWork({ nx: 64, ny: 64 }, 1210)).toBeGreaterThan(budget);
  });
});
