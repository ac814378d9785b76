import {
  type DeviceSpec,
  mergeUseProfile,
  type Trip,
  type TripDeviceDetail,
  type TripMember,
  type TripRole,
  type TripSolarInput,
  type TripSummary,
  tripEndDate,
  tripPhase,
  tripSolarInputSchema,
  utcToLocalClock,
} from '@gramwatt/shared';
import type { LockerItemRow, TripDeviceRow, TripMemberRow, TripRow } from '../database/schema';

/** A member row with the account fields the API shows. */
export interface TripMemberWithAccount extends TripMemberRow {
  displayName: string;
  email: string;
}

/** A trip device row with its locker item (whose spec is a device spec). */
export interface TripDeviceWithItem {
  device: TripDeviceRow;
  item: LockerItemRow & { spec: DeviceSpec };
}

/** Whether a locker item's spec is (still) a device. */
export function isDeviceItem(item: LockerItemRow): item is LockerItemRow & { spec: DeviceSpec } {
  return item.spec.kind === 'device';
}

/** Today's date at the trip's place, `YYYY-MM-DD`. */
export function localToday(now: Date, timeZone: string): string {
  return utcToLocalClock(now.getTime(), timeZone).date;
}

export function toTripMember(row: TripMemberWithAccount): TripMember {
  return {
    accountId: row.accountId,
    displayName: row.displayName,
    email: row.email,
    role: row.role,
    gramLimitG: row.gramLimitG,
    joinedAt: row.joinedAt.toISOString(),
  };
}

/**
 * A trip device as the API shows it: the locker spec, the default and effective use profiles, and who
 * carries it (the owner when no carrier is set or the carrier is no longer on the trip).
 */
export function toTripDeviceDetail(
  { device, item }: TripDeviceWithItem,
  memberIds: ReadonlySet<string>,
): TripDeviceDetail {
  const defaultUseProfile = item.spec.useProfile;
  const merge = mergeUseProfile(defaultUseProfile, device.useProfileOverride, { deviceKind: item.spec.deviceKind });
  const carrier =
    device.carrierAccountId !== null && memberIds.has(device.carrierAccountId) ? device.carrierAccountId : item.ownerId;
  return {
    id: device.id,
    itemId: item.id,
    name: item.name,
    notes: item.notes,
    massG: item.massG,
    ownerAccountId: item.ownerId,
    carrierAccountId: carrier,
    spec: item.spec,
    defaultUseProfile,
    useProfileOverride: device.useProfileOverride ?? null,
    useProfile: merge.ok ? merge.useProfile : defaultUseProfile,
    overriddenFields: merge.ok ? merge.overriddenFields : [],
    overrideIssues: merge.ok
      ? []
      : merge.issues.map((issue) => ({
          path: ['useProfileOverride', ...issue.path].join('.'),
          message: issue.message,
        })),
    createdAt: device.createdAt.toISOString(),
    // The device's part of the trip changed when its override or carrier did, or when its locker item's spec (battery,
    // charge power, default use) was edited: either may turn a chosen kit's verdict stale.
    updatedAt: new Date(Math.max(device.updatedAt.getTime(), item.specChangedAt.getTime())).toISOString(),
  };
}

/** The stored engine input, re-read through its schema (so defaults added later apply to old rows). */
export function storedSolarInput(row: TripRow): TripSolarInput {
  return tripSolarInputSchema.parse(row.solarInput);
}

function ownFields(row: TripRow, role: TripRole, today: string) {
  return {
    id: row.id,
    name: row.name,
    notes: row.notes,
    skyPresetId: row.skyPresetId,
    reserveShare: row.reserveShare,
    gramLimitG: row.gramLimitG,
    timeZoneDerived: row.timeZoneDerived,
    endDate: tripEndDate(row),
    phase: tripPhase(row, today),
    myRole: role,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** The whole trip: every input field, members, devices and the engine input. */
export function toTrip(
  row: TripRow,
  role: TripRole,
  now: Date,
  members: TripMemberWithAccount[],
  devices: TripDeviceDetail[],
): Trip {
  const solarInput = storedSolarInput(row);
  return {
    ...solarInput,
    ...ownFields(row, role, localToday(now, row.timeZone)),
    members: members.map(toTripMember),
    devices,
    solarInput,
  };
}

/** A line of the trip list. */
export function toTripSummary(
  row: TripRow,
  role: TripRole,
  now: Date,
  counts: { memberCount: number; deviceCount: number },
): TripSummary {
  return {
    ...ownFields(row, role, localToday(now, row.timeZone)),
    startDate: row.startDate,
    nights: row.nights,
    latitudeDeg: row.latitudeDeg,
    longitudeDeg: row.longitudeDeg,
    timeZone: row.timeZone,
    ...counts,
  };
}
