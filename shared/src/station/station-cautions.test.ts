import { describe, expect, it } from 'vitest';
import { stationCautions, stationCautionTexts } from './station-cautions.js';

describe('station cautions', () => {
  it('a LiFePO₄ station with a controller and a DC lead: protection, cold charging, controller order, fusing, defer', () => {
    expect(
      stationCautions({ chemistries: ['lifepo4'], hasController: true, hasDcLead: true }).map((c) => c.id),
    ).toEqual([
      'lithium-protection',
      'lithium-cold-charge',
      'controller-before-panel',
      'fuse-positive-near-battery',
      'defer-to-maker',
    ]);
  });
  it('lead-acid: gassing instead of the lithium cautions', () => {
    const ids = stationCautions({ chemistries: ['lead-acid'], hasController: false, hasDcLead: false }).map(
      (c) => c.id,
    );
    expect(ids).toEqual(['lead-acid-gassing', 'fuse-positive-near-battery', 'defer-to-maker']);
  });
  it('nothing of the 12 V path: only the deference to the manufacturer; it is always last (info)', () => {
    expect(stationCautions({ chemistries: [], hasController: false, hasDcLead: false }).map((c) => c.id)).toEqual([
      'defer-to-maker',
    ]);
    const all = stationCautions({ chemistries: ['lipo', 'lead-acid'], hasController: true, hasDcLead: true });
    expect(all.at(-1)?.id).toBe('defer-to-maker');
    expect(all.at(-1)?.severity).toBe('info');
  });
  it('the sentences say what the brief asks', () => {
    expect(stationCautionTexts['lithium-protection']).toMatch(/protection/);
    expect(stationCautionTexts['lithium-protection']).toMatch(/controller set for their chemistry/);
    expect(stationCautionTexts['lithium-cold-charge']).toMatch(/below 0 °C/);
    expect(stationCautionTexts['lead-acid-gassing']).toMatch(/overcharged/);
    expect(stationCautionTexts['controller-before-panel']).toMatch(/controller to the battery before the panel/);
    expect(stationCautionTexts['defer-to-maker']).toMatch(/manufacturer/);
    expect(stationCautionTexts['defer-to-maker']).toMatch(/licensed practice/);
  });
});
