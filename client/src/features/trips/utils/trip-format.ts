import { skyPresets, type Trip, type TripPhase } from '@gramwatt/shared';

export { formatDate, formatPlace } from '@/lib/format';

export const phaseLabel: Record<TripPhase, string> = { upcoming: 'Upcoming', ongoing: 'Under way', past: 'Past' };

const percent = (share: number) => `${Math.round(share * 100)} %`;

/** The sky in words: the preset's name and description, or the member's own values spelled out. */
export function describeSky(trip: Pick<Trip, 'sky' | 'skyPresetId'>): string {
  const preset = skyPresets.find((p) => p.id === trip.skyPresetId);
  const { clearShare, cloudyPersistence, cloudyTransmission, canopyShade } = trip.sky;
  const values = `${percent(clearShare)} of days clear; after a cloudy day, ${percent(cloudyPersistence)} chance of another; a cloudy day lets through ${percent(cloudyTransmission)} of the sun; ${percent(canopyShade)} shade.`;
  return preset ? `${preset.label}: ${preset.description}` : `Own values: ${values}`;
}
