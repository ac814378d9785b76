import { describe, expect, it } from 'vitest';
import { lookupTimeZone } from './time-zone-lookup';

/** ISO 6709 ±DDMM[SS] / ±DDDMM[SS] as written in zone.tab → decimal degrees. */
function iso6709(text: string, degreeDigits: 2 | 3): number {
  const sign = text.startsWith('-') ? -1 : 1;
  const digits = text.slice(1);
  const deg = Number(digits.slice(0, degreeDigits));
  const min = Number(digits.slice(degreeDigits, degreeDigits + 2));
  const sec = digits.length > degreeDigits + 2 ? Number(digits.slice(degreeDigits + 2)) : 0;
  return sign * (deg + min / 60 + sec / 3600);
}

/**
 * Principal-city coordinates of zones, copied from the IANA tz database's `zone.tab` (release 2025b,
 * as installed by Debian's tzdata 2025b package): the point each zone is named for must lie in it.
 */
const zoneTab: [coordinates: string, zone: string][] = [
  ['+5955+01045', 'Europe/Oslo'],
  ['+4723+00832', 'Europe/Zurich'],
  ['+4024-00341', 'Europe/Madrid'],
  ['+394421-1045903', 'America/Denver'],
  ['+332654-1120424', 'America/Phoenix'],
  ['+611305-1495401', 'America/Anchorage'],
  ['+4734-05243', 'America/St_Johns'],
  ['-2332-04637', 'America/Sao_Paulo'],
  ['-3327-07040', 'America/Santiago'],
  ['-0117+03649', 'Africa/Nairobi'],
  ['-2615+02800', 'Africa/Johannesburg'],
  ['+2232+08822', 'Asia/Kolkata'],
  ['+2743+08519', 'Asia/Kathmandu'],
  ['+4755+10653', 'Asia/Ulaanbaatar'],
  ['+353916+1394441', 'Asia/Tokyo'],
  ['-4253+14719', 'Australia/Hobart'],
  ['-3652+17446', 'Pacific/Auckland'],
];

describe('lookupTimeZone', () => {
  it.each(zoneTab)('finds %s in %s (IANA zone.tab 2025b)', (coordinates, zone) => {
    const match = /^([+-]\d+)([+-]\d+)$/.exec(coordinates);
    if (!match?.[1] || !match[2]) throw new Error(`bad zone.tab coordinates ${coordinates}`);
    const latitudeDeg = iso6709(match[1], 2);
    const longitudeDeg = iso6709(match[2], 3);
    expect(lookupTimeZone(latitudeDeg, longitudeDeg)).toBe(zone);
  });

  it('reads zone.tab coordinates as the tz database documents them (±DDMM±DDDMM, ±DDMMSS±DDDMMSS)', () => {
    expect(iso6709('+5955', 2)).toBeCloseTo(59.9167, 4);
    expect(iso6709('-1045903', 3)).toBeCloseTo(-104.984167, 5);
  });

  it('answers a nautical zone over open sea, with the POSIX sign (Etc/GMT+N is UTC−N)', () => {
    // South Pacific, South Atlantic and Indian Ocean points far from any coast; nautical zones are 15° wide
    // centred on multiples of 15°, named with the POSIX sign (IANA tz database, file `etcetera`).
    expect(lookupTimeZone(-45, -130)).toBe('Etc/GMT+9');
    expect(lookupTimeZone(-40, -25)).toBe('Etc/GMT+2');
    expect(lookupTimeZone(-35, 80)).toBe('Etc/GMT-5');
  });
});
