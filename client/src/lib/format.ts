/** Formats shared by every screen that shows a trip (the trip page, the party's shared page). */

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

/** The place as degrees with hemispheres: "61.2034° N, 9.8012° E". */
export function formatPlace(latitudeDeg: number, longitudeDeg: number): string {
  const lat = `${Math.abs(latitudeDeg).toFixed(4)}° ${latitudeDeg >= 0 ? 'N' : 'S'}`;
  const lon = `${Math.abs(longitudeDeg).toFixed(4)}° ${longitudeDeg >= 0 ? 'E' : 'W'}`;
  return `${lat}, ${lon}`;
}
