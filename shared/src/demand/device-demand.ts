import type { DeviceSpec, UseProfile } from '../schemas/devices.js';
import { minutesToHours } from '../units/energy.js';

/**
 * Energy a device uses per day at the device, Wh, from its use profile:
 * radio = transmit A × V × transmit h + receive A × V × receive h + standby A × V × standby h (at the nominal supply
 * voltage); others = share of own battery per day × battery Wh, or a stated Wh per day. Energy = V × I × t (SI
 * Brochure, 9th ed., table 4); the per-state current method is the usual duty-cycle budget for a transceiver
 * (ARRL Handbook for Radio Communications, power supply chapter; from memory).
 * @example deviceDemandWhPerDay(radio) // 1.5 A × 13.8 V × 1/3 h + 0.25 A × 13.8 V × 3 h + 0.05 A × 13.8 V × 10 h = 24.15
 */
export function deviceDemandWhPerDay(device: DeviceSpec, useProfile: UseProfile = device.useProfile): number {
  switch (useProfile.basis) {
    case 'radio-hours': {
      const volts = device.supplyVoltsNominal ?? 0;
      const transmitH = minutesToHours(useProfile.transmitMinutesPerDay);
      return (
        volts *
        ((device.transmitCurrentA ?? 0) * transmitH +
          (device.receiveCurrentA ?? 0) * useProfile.receiveHoursPerDay +
          (device.standbyCurrentA ?? 0) * useProfile.standbyHoursPerDay)
      );
    }
    case 'battery-share':
      return useProfile.batterySharePerDay * device.ownBatteryWh;
    case 'energy':
      return useProfile.energyWhPerDay;
  }
}

/**
 * Energy drawn from storage to put `energyAtDeviceWh` into a device, Wh: divided by the efficiencies of the
 * charging path after the store's own output (a converter, if any, then the device's charging circuit). The store's
 * output loss is not applied again: it is counted once, in the store's usable energy.
 * @example storageDrawWh(10, { converterEfficiency: 0.85, deviceChargeEfficiency: 0.9 }) // 13.07…
 */
export function storageDrawWh(
  energyAtDeviceWh: number,
  path: { converterEfficiency?: number; deviceChargeEfficiency: number },
): number {
  return energyAtDeviceWh / ((path.converterEfficiency ?? 1) * path.deviceChargeEfficiency);
}

/**
 * Whether a device needs a charging path on a trip: only when its own battery (starting full) cannot cover its demand
 * over the trip's days.
 * @example needsChargingPath(phone, 3) // true when 3 days × demand > own battery Wh
 */
export function needsChargingPath(
  device: DeviceSpec,
  tripDays: number,
  useProfile: UseProfile = device.useProfile,
): boolean {
  return deviceDemandWhPerDay(device, useProfile) * tripDays > device.ownBatteryWh * (1 + 1e-12);
}

/**
 * The device's charge power at its input, W: its stated charge power, else charge current × the voltage it charges
 * at (5 V USB, the requested USB PD voltage — 9 V when none is given — or the nominal supply voltage for 12 V DC).
 * @example deviceChargePowerW({ chargesVia: 'usb-5v', chargeCurrentA: 2, … }) // 10
 */
export function deviceChargePowerW(device: DeviceSpec): number {
  if (device.chargePowerW !== undefined) return device.chargePowerW;
  return (device.chargeCurrentA ?? 0) * deviceChargeVolts(device);
}

/**
 * The voltage a device charges at, V: 5 V for USB, its USB PD voltage (default 9 V) for USB PD, and its nominal supply
 * voltage (default 13.8 V, the usual rating of mobile radios — common practice) for 12 V DC.
 * @example deviceChargeVolts({ chargesVia: 'usb-5v', … }) // 5
 */
export function deviceChargeVolts(device: DeviceSpec): number {
  switch (device.chargesVia) {
    case 'usb-5v':
      return 5;
    case 'usb-pd':
      return device.usbPdVolts ?? 9;
    case '12v-dc':
      return device.supplyVoltsNominal ?? 13.8;
  }
}
