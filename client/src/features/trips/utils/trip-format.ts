import { skyPresets, type Trip, type TripPhase } from '@gramwatt/shared';

/** "12 Jul 2027" from `YYYY-MM-DD`, read as a calendar date (no time zone shift). */
export function formatDate(isoDate: string): string {
  const [y, m, d] = isoDate.split('-').map(Number);
  if (!y || !m || !d) return isoDate;
  return new Date(Date.UTC(y, m - 1, d)).toLocaleDateString('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  });
}

export const phaseLabel: Record<TripPhase, string> = { upcoming: 'Upcoming', ongoing: 'Under way', past: 'Past' };

/** The place as degrees with hemispheres: "61.2034° N, 9.8012° E". */
export function formatPlace(latitudeDeg: number, longitudeDeg: number): string {
  const lat = `${Math.abs(latitudeDeg).toFixed(4)}° ${latitudeDeg >= 0 ? 'N' : 'S'}`;
  const lon = `${Math.abs(longitudeDeg).toFixed(4)}° ${longitudeDeg >= 0 ? 'E' : 'W'}`;
  return `${lat}, ${lon}`;
}

const percent = (share: number) => `${Math.round(share * 100)} %`;

/** The sky in words: the preset's name and description, or the member's own values spelled out. */
export function describeSky(trip: Pick<Trip, 'sky' | 'skyPresetId'>): string {
  const preset = skyPresets.find((p) => p.id === trip.skyPresetId);
  const { clearShare, cloudyPersistence, cloudyTransmission, canopyShade } = trip.sky;
  const values = `${percent(clearShare)} of days clear; after a cloudy day, ${percent(cloudyPersistence)} chance of another; a cloudy day lets through ${percent(cloudyTransmission)} of the sun; ${percent(canopyShade)} shade.`;
  return preset ? `${preset.label}: ${preset.description}` : `Own values: ${values}`;
}
