import { describe, expect, it } from 'vitest';
import { wouldRunDryText } from './verdict.js';

describe('wouldRunDryText', () => {
  it('names the dry day while it is within three times the trip', () => {
    expect(wouldRunDryText(8, 6)).toBe('it would run dry on day 9 if the trip went on');
    expect(wouldRunDryText(17, 6)).toBe('it would run dry on day 18 if the trip went on');
  });

  it('says "well past" for a slow drain instead of naming a far-off day', () => {
    expect(wouldRunDryText(18, 6)).toBe('at this rate it would last well past day 18 if the trip went on');
    expect(wouldRunDryText(Number.MAX_SAFE_INTEGER - 6, 6)).toMatch(/well past day 18/);
  });

  it('never looks further than twice the longest trip', () => {
    expect(wouldRunDryText(500, 61)).toBe('at this rate it would last well past day 122 if the trip went on');
  });
});
