import type { SkyPresetId } from '../sky/sky-presets.js';

/**
 * Defaults and limits of a trip's own fields (the sun/sky fields keep theirs in the trip solar schema).
 * Defaults are starting values the trip form shows for the member to change, not facts about any place.
 */

/**
 * Daily low and high air temperature when none is given, °C: a mild three-season day. A form default only;
 * the member should enter the place's figures (cold matters for lithium charging below 0 °C).
 */
export const defaultDailyLowC = 5;
/** See {@link defaultDailyLowC}. */
export const defaultDailyHighC = 20;

/** Sky preset a trip starts with when neither a preset nor custom values are given. */
export const defaultSkyPresetId: SkyPresetId = 'mixed';

/** Longest trip name, in characters. */
export const maxTripNameLength = 120;
/** Longest trip notes, in characters. */
export const maxTripNotesLength = 5000;
/** Largest gram limit accepted for a trip or a person, g (50 kg of power gear is far past any pack). */
export const maxTripGramLimitG = 50_000;
