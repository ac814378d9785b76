import { type SkyPresetId, type SkyPresetValues, skyPresets } from '../sky/sky-presets.js';
import { defaultSkyPresetId } from './trip-defaults.js';

/** Two sky values closer than this count as the same (they are shares 0–1 typed into a form). */
const skyValueTolerance = 1e-9;

/**
 * The values of a sky preset.
 * @example skyPresetValues('mixed').clearShare // 0.5
 */
export function skyPresetValues(id: SkyPresetId): SkyPresetValues {
  const preset = skyPresets.find((candidate) => candidate.id === id);
  if (!preset) throw new Error(`Unknown sky preset ${id}`);
  return { ...preset.values };
}

/**
 * Whether sky values equal a preset's (within 1e-9 on every share).
 * @example skyMatchesPreset(skyPresetValues('open-sky'), 'open-sky') // true
 */
export function skyMatchesPreset(sky: SkyPresetValues, id: SkyPresetId): boolean {
  const preset = skyPresetValues(id);
  return (Object.keys(preset) as (keyof SkyPresetValues)[]).every(
    (key) => Math.abs(preset[key] - sky[key]) <= skyValueTolerance,
  );
}

/** A trip's sky as stored: the values the engine uses and the preset they came from, if any. */
export interface ResolvedTripSky {
  sky: SkyPresetValues;
  skyPresetId: SkyPresetId | null;
}

/**
 * The sky of a trip body: custom values, a preset, or (neither given) the default preset. A body that
 * gives both has already been checked to agree (`tripInputSchema`).
 * @example resolveTripSky(undefined, 'socked-in') // { sky: { clearShare: 0.25, ... }, skyPresetId: 'socked-in' }
 * @example resolveTripSky(undefined, undefined).skyPresetId // 'mixed'
 */
export function resolveTripSky(
  sky: SkyPresetValues | undefined,
  skyPresetId: SkyPresetId | null | undefined,
  defaultPresetId: SkyPresetId = defaultSkyPresetId,
): ResolvedTripSky {
  if (skyPresetId) return { sky: skyPresetValues(skyPresetId), skyPresetId };
  if (sky) return { sky: { ...sky }, skyPresetId: null };
  return { sky: skyPresetValues(defaultPresetId), skyPresetId: defaultPresetId };
}
