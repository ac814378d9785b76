/** Numbers on screen: at most two decimals, thousands grouped. */
const numberFormat = new Intl.NumberFormat('en', { maximumFractionDigits: 2 });

/** @example formatNumber(10000) // '10,000' */
export const formatNumber = (value: number): string => numberFormat.format(value);

/** @example formatGrams(1234) // '1,234 g' */
export const formatGrams = (massG: number): string => `${numberFormat.format(Math.round(massG))} g`;

/** A share 0–1 shown as percent. @example formatPercent(0.85) // '85 %' */
export const formatPercent = (share: number): string => `${numberFormat.format(share * 100)} %`;

/** @example formatBytes(2_500_000) // '2.4 MB' */
export const formatBytes = (bytes: number): string => {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${numberFormat.format(Math.round(bytes / 102.4) / 10)} kB`;
  return `${numberFormat.format(Math.round(bytes / (1024 * 102.4)) / 10)} MB`;
};
