import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { SunPath } from '../api/types';
import { daylightHours, sunPeak, sunRows } from '../utils/chart-series';
import { dayLabel, formatHours, formatShortDate } from '../utils/format';
import { clockTime } from '../utils/local-time';
import { ChartFigure, LineSwatch } from './chart-figure';
import { chartColours, chartInitialSize, chartTick } from './chart-palette';

const minutesPerDay = 24 * 60;
const clockTicks = [0, 3, 6, 9, 12, 15, 18, 21, 24].map((h) => h * 60);

const pathLabel = (path: SunPath) => `${dayLabel(path.dayIndex)}, ${formatShortDate(path.date)}`;

function summaryOf(paths: readonly SunPath[]): string {
  return paths
    .map((path) => {
      const peak = sunPeak(path);
      return peak
        ? `${pathLabel(path)}: the sun is up about ${formatHours(Math.round(daylightHours(path)))} and stands highest at ${Math.round(peak.altitudeDeg)}° around ${peak.localTime}.`
        : '';
    })
    .join(' ');
}

/** The sun's altitude against the local clock on the first and the last trip day; below the horizon is cut off. */
export function SunPathChart({ paths }: { paths: readonly SunPath[] }) {
  const styles = [
    { stroke: chartColours.sunFirst, strokeDasharray: undefined },
    { stroke: chartColours.sunLast, strokeDasharray: '6 4' },
  ];
  const peakDeg = Math.max(10, ...paths.map((p) => sunPeak(p)?.altitudeDeg ?? 0));
  return (
    <ChartFigure
      title="The sun's path, first and last day"
      summary={summaryOf(paths)}
      legend={paths.map((path, i) => ({
        label: pathLabel(path),
        swatch: <LineSwatch colour={styles[i]?.stroke ?? chartColours.ink} dashed={i > 0} />,
      }))}
    >
      <ResponsiveContainer width="100%" height="100%" initialDimension={chartInitialSize}>
        <LineChart margin={{ top: 8, right: 12, bottom: 0, left: 0 }}>
          <CartesianGrid stroke={chartColours.grid} vertical={false} />
          <XAxis
            dataKey="minutes"
            type="number"
            domain={[0, minutesPerDay]}
            ticks={clockTicks}
            tickFormatter={(m: number) => clockTime(m === minutesPerDay ? 0 : m)}
            tick={chartTick}
            tickLine={false}
            allowDuplicatedCategory={false}
          />
          <YAxis
            dataKey="altitudeDeg"
            domain={[0, Math.ceil(peakDeg / 10) * 10]}
            allowDataOverflow
            tick={chartTick}
            width={44}
            tickFormatter={(deg: number) => `${deg}°`}
          />
          <ReferenceLine y={0} stroke={chartColours.axis} />
          <Tooltip
            labelFormatter={(m) => `${clockTime(Number(m))} local time`}
            formatter={(deg, name) => [`${Math.round(Number(deg))}° above the horizon`, String(name)]}
          />
          {paths.map((path, i) => (
            <Line
              key={path.dayIndex}
              data={sunRows(path)}
              dataKey="altitudeDeg"
              name={pathLabel(path)}
              type="monotone"
              dot={false}
              strokeWidth={2.5}
              isAnimationActive={false}
              {...styles[i]}
            />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}
