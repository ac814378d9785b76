/** Clock times of the trip's place, as the API gives them (`HH:MM`, local to the trip). */

const minutesPerDay = 24 * 60;
const msPerMinute = 60_000;

/** @example minutesOfDay('08:30') // 510 */
export const minutesOfDay = (localTime: string): number => {
  const [h = 0, m = 0] = localTime.split(':').map(Number);
  return h * 60 + m;
};

/** @example clockTime(1470) // '00:30' (the next day) */
export const clockTime = (minutes: number): string => {
  const inDay = ((Math.round(minutes) % minutesPerDay) + minutesPerDay) % minutesPerDay;
  return `${String(Math.floor(inDay / 60)).padStart(2, '0')}:${String(inDay % 60).padStart(2, '0')}`;
};

/** A local clock time and how many midnights lie between it and the session's start. */
export interface LocalClock {
  time: string;
  /** 0 the same day, 1 the next morning, … */
  daysLater: number;
}

/**
 * The local clock at which a session ends, from its local start and its UTC start and end: the trip's time zone
 * stays on the server, and the session's length carries it across. A session over a change of clocks is off by
 * the change, which a packing list can bear.
 * @example localEnd('16:00', '2026-12-23T14:00:00Z', '2026-12-24T06:30:00Z') // { time: '08:30', daysLater: 1 }
 */
export const localEnd = (startLocalTime: string, startIso: string, endIso: string): LocalClock => {
  const lengthMin = (Date.parse(endIso) - Date.parse(startIso)) / msPerMinute;
  const endMin = minutesOfDay(startLocalTime) + lengthMin;
  return { time: clockTime(endMin), daysLater: Math.floor(endMin / minutesPerDay) };
};
