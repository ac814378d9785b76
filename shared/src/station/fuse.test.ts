import { describe, expect, it } from 'vitest';
import { suggestFuse } from './fuse.js';

// Ampacity: NFPA 70 (NEC) Table 400.5(A)(1), column B, two current-carrying conductors (from memory):
// 18 AWG 10 A, 16 AWG 13 A, 14 AWG 18 A, 12 AWG 25 A, 10 AWG 30 A. Blade fuse ratings: ISO 8820-3 (from memory).
// Margin: 125 % of the radio's largest current (common practice).

describe('fuse suggestion from the radio’s largest current and the lead’s gauge', () => {
  it('a 20 A mobile radio on 12 AWG: 20 × 1.25 = 25 A fuse, which 12 AWG (25 A) carries', () => {
    const s = suggestFuse(20, { gaugeAwg: 12 });
    expect(s.loadWithMarginA).toBeCloseTo(25, 12);
    expect(s.fuseA).toBe(25);
    expect(s.leadAmpacityA).toBe(25);
    expect(s.warnings).toEqual([]);
  });
  it('a 2 A handheld on 18 AWG: 2.5 A → the next blade rating, 3 A', () => {
    expect(suggestFuse(2, { gaugeAwg: 18 }).fuseA).toBe(3);
  });
  it('a 9 A radio: 11.25 A → 15 A fuse, too much for 16 AWG (13 A): use a heavier lead', () => {
    const s = suggestFuse(9, { gaugeAwg: 16 });
    expect(s.fuseA).toBe(15);
    expect(s.warnings.map((w) => w.id)).toEqual(['lead-too-thin-for-fuse']);
  });
  it('22 AWG is not in the table: warned, fuse still sized for the radio', () => {
    const s = suggestFuse(1, { gaugeAwg: 22 });
    expect(s.fuseA).toBe(2);
    expect(s.leadAmpacityA).toBeUndefined();
    expect(s.warnings.map((w) => w.id)).toEqual(['lead-gauge-not-rated']);
  });
  it('a 40 A load needs more than the largest blade fuse', () => {
    const s = suggestFuse(40, { gaugeAwg: 8 });
    expect(s.fuseA).toBeUndefined();
    expect(s.warnings.map((w) => w.id)).toContain('lead-too-thin-for-fuse');
  });
  it('a fuse already in the lead is checked both ways', () => {
    expect(suggestFuse(9, { gaugeAwg: 16, fuseA: 30 }).warnings.map((w) => w.id)).toContain('fuse-over-lead-rating');
    expect(suggestFuse(20, { gaugeAwg: 12, fuseA: 10 }).warnings.map((w) => w.id)).toEqual(['fuse-below-load']);
  });
  it('always carries the caution to fuse the positive lead close to the battery', () => {
    for (const s of [
      suggestFuse(20, { gaugeAwg: 12 }),
      suggestFuse(1, { gaugeAwg: 22 }),
      suggestFuse(40, { gaugeAwg: 8 }),
    ]) {
      expect(s.caution.id).toBe('fuse-positive-near-battery');
      expect(s.caution.text).toMatch(/positive lead/);
      expect(s.caution.text).toMatch(/close to the battery/);
    }
  });
});
