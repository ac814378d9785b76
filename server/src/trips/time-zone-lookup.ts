import { isValidTimeZone } from '@gramwatt/shared';
import tzLookup from '@photostructure/tz-lookup';

/** Degrees of longitude per hour of nautical time zone (360° / 24 h). */
const degreesPerZoneHour = 15;

/**
 * The nautical zone of a longitude as an IANA `Etc/GMT±N` name (POSIX sign: `Etc/GMT-5` is UTC+5).
 * Used only when the lookup gives a zone this runtime does not know.
 */
function nauticalZone(longitudeDeg: number): string {
  const offsetH = Math.round(longitudeDeg / degreesPerZoneHour);
  if (offsetH === 0) return 'Etc/GMT';
  return `Etc/GMT${offsetH > 0 ? '-' : '+'}${Math.abs(offsetH)}`;
}

/**
 * The IANA time zone of a point, from the zone boundaries shipped in `@photostructure/tz-lookup` (land
 * zones; over open sea the nautical `Etc/GMT±N` zones). Near a zone border the answer may be the
 * neighbour's (the package's boundaries are simplified to a few kilometres).
 * @example lookupTimeZone(59.9167, 10.75) // 'Europe/Oslo'
 */
export function lookupTimeZone(latitudeDeg: number, longitudeDeg: number): string {
  const zone = tzLookup(latitudeDeg, longitudeDeg);
  return isValidTimeZone(zone) ? zone : nauticalZone(longitudeDeg);
}
