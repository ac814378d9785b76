import { buildTripSolarInput, type TripInput } from '@gramwatt/shared';
import type { NewTripRow } from '../database/schema';
import { lookupTimeZone } from './time-zone-lookup';

/**
 * The `trips` columns a validated trip body sets (the same on create, on a full replace and in the demo
 * seed): the engine input with the time zone given or derived from the start point, the sky from its
 * preset or custom values, and the copied-out columns.
 */
export function tripRowValues(input: TripInput): Omit<NewTripRow, 'id' | 'createdAt' | 'updatedAt'> {
  const timeZoneDerived = input.timeZone === undefined;
  const timeZone = input.timeZone ?? lookupTimeZone(input.latitudeDeg, input.longitudeDeg);
  const { solarInput, skyPresetId } = buildTripSolarInput(input, timeZone);
  return {
    name: input.name,
    notes: input.notes,
    startDate: solarInput.startDate,
    nights: solarInput.nights,
    latitudeDeg: solarInput.latitudeDeg,
    longitudeDeg: solarInput.longitudeDeg,
    timeZone,
    timeZoneDerived,
    skyPresetId,
    reserveShare: input.reserveShare,
    gramLimitG: input.gramLimitG,
    solarInput,
  };
}
