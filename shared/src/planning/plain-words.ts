/** Our own wording for plan answers: short sentences a hiker reads, figures rounded as a hiker would. */

const skyNames: Record<string, string> = {
  expected: 'the expected sky',
  'cloudy-start': 'a cloudy run at the start',
  'cloudy-middle': 'a cloudy run mid-trip',
  'cloudy-end': 'a cloudy run at the end',
};

/** "a cloudy run at the start" for a design sky id. */
export function skyName(skyId: string): string {
  return skyNames[skyId] ?? skyId;
}

/** 1-based day for people ("day 3"). */
export function dayLabel(dayIndex: number): string {
  return `day ${dayIndex + 1}`;
}

/** Grams as text: "1,240 g". */
export function gramsText(massG: number): string {
  return `${Math.round(massG).toLocaleString('en-GB')} g`;
}

/** A share as whole percent: "31 %". */
export function percentText(share: number): string {
  return `${Math.round(share * 100)} %`;
}

/** Counted item names: "2 × Larch bank", "Ridge panel". */
export function countedName(name: string, count: number): string {
  return count > 1 ? `${count} × ${name}` : name;
}

/** A list in words: "a, b and c". */
export function listText(parts: readonly string[]): string {
  if (parts.length <= 1) return parts.join('');
  return `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}`;
}

/** What a swap buys, by the optimiser's codes. */
export const buysText: Record<string, string> = {
  'more-margin': 'more to spare on the worst day',
  'fewer-items': 'fewer things to carry',
  'no-converter': 'no converter to carry',
  'no-lead': 'no lead to carry',
  'no-panel': 'no panel to carry',
};
