import type { TripDevice } from '../schemas/kit.js';
import type { TripDeviceDetail } from '../schemas/trips.js';

/**
 * The engine's view of a trip's devices: each device's locker spec with the trip's effective use profile
 * in place of the locker default, keyed by the locker item id. What the simulation and the solver take.
 * @example toEngineTripDevices(trip.devices)[0] // { deviceId: '<item id>', spec: { kind: 'device', ..., useProfile: <effective> } }
 */
export function toEngineTripDevices(devices: readonly TripDeviceDetail[]): TripDevice[] {
  return devices.map((device) => ({
    deviceId: device.itemId,
    spec: { ...device.spec, useProfile: device.useProfile },
  }));
}
