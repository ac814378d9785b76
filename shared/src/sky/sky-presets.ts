/**
 * Sky presets of our own naming. The numbers are rough climatological types, not measurements of any
 * place: `from memory` of typical cloud-cover statistics (dry continental summers have most days clear;
 * maritime and monsoon seasons few), and `common practice` for what an overcast day lets through (heavy
 * overcast passes roughly 10–30 % of clear-sky global irradiance).
 */

/** The sky fields of a trip (see the trip solar schema). */
export interface SkyPresetValues {
  /** Long-run share of clear days p, 0–1. */
  clearShare: number;
  /** P(cloudy tomorrow | cloudy today) q, 0–1. */
  cloudyPersistence: number;
  /** Share of clear-sky global irradiance a cloudy day lets through c, 0–1 (all of it diffuse). */
  cloudyTransmission: number;
  /** Share of light blocked by trees or terrain, 0–1. */
  canopyShade: number;
  /** Design likelihood L, 0–1. */
  designLikelihood: number;
}

/** Preset ids. */
export type SkyPresetId = 'open-sky' | 'mixed' | 'socked-in';

/** A named preset with a label for the screen. */
export interface SkyPreset {
  id: SkyPresetId;
  label: string;
  description: string;
  values: SkyPresetValues;
}

/**
 * Three presets: "open sky" (dry, settled weather), "mixed" (changeable mid-latitude weather) and
 * "socked in" (long grey spells). All use L = 0.9 and no canopy shade.
 */
export const skyPresets: readonly SkyPreset[] = [
  {
    id: 'open-sky',
    label: 'Open sky',
    description: 'Settled, dry weather: most days clear, cloudy spells short.',
    values: { clearShare: 0.8, cloudyPersistence: 0.3, cloudyTransmission: 0.3, canopyShade: 0, designLikelihood: 0.9 },
  },
  {
    id: 'mixed',
    label: 'Mixed',
    description: 'Changeable weather: about half the days clear, grey days come in pairs.',
    values: {
      clearShare: 0.5,
      cloudyPersistence: 0.5,
      cloudyTransmission: 0.25,
      canopyShade: 0,
      designLikelihood: 0.9,
    },
  },
  {
    id: 'socked-in',
    label: 'Socked in',
    description: 'Long grey spells: few clear days, cloud that stays for days.',
    values: {
      clearShare: 0.25,
      cloudyPersistence: 0.75,
      cloudyTransmission: 0.15,
      canopyShade: 0,
      designLikelihood: 0.9,
    },
  },
];
