/**
 * The few shades of our palette (tailwind.config.ts) the charts draw with. SVG presentation attributes need literal
 * colours, so they are repeated here; keep them in step with the config.
 */
export const chartColours = {
  ink: '#1c2122', // scree-900: the binding sky, the axis text
  grid: '#dde4e2', // firn-200
  axis: '#4a5556', // scree-600
  stored: '#446a35', // moss-600: the expected sky, the harvest
  demand: '#3b4445', // scree-700: what the devices used
  dry: '#a96514', // larch-600: dry days, as in the strip
  sunFirst: '#cf861b', // larch-500: the first day's sun
  sunLast: '#256385', // tarn-600: the last day's sun
} as const;

/** Chart text in Lexend at the body's small size. */
export const chartTick = { fill: chartColours.axis, fontSize: 12, fontFamily: 'Lexend, ui-sans-serif, sans-serif' };

/** A chart's size before its container is measured (and in tests, where nothing is): a phone-width figure, px. */
export const chartInitialSize = { width: 320, height: 224 };
