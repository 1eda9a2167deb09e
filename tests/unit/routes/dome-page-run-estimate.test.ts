import { describe, expect, it } from 'vitest';
import { ASSUMED_RAYS_PER_SECOND, estimateSeconds, fmtDuration } from '../../../src/routes/dome/run-estimate';

describe('run estimate (dome page)', () => {
  it('estimates (package + bare-chip rays) / speed, with the assumed speed before any timing', () => {
    expect(estimateSeconds(1_000_000, 500_000)).toBe(4);
    expect(estimateSeconds(10_000_000, 1_000_000)).toBe(12);
    expect(estimateSeconds(1_000_000, null)).toBe(2_000_000 / ASSUMED_RAYS_PER_SECOND);
    expect(estimateSeconds(1_000_000, Number.NaN)).toBe(2_000_000 / ASSUMED_RAYS_PER_SECOND);
  });

  it('words a duration in seconds, minutes or hours, never NaN', () => {
    expect(fmtDuration(0.2)).toBe('about 1 s');
    expect(fmtDuration(40)).toBe('about 40 s');
    expect(fmtDuration(600)).toBe('about 10 min');
    expect(fmtDuration(9000)).toBe('about 2.5 h');
    expect(fmtDuration(Number.NaN)).toBe('an unknown time');
  });
});
