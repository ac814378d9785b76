import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { KitEvaluation } from '../api/types';
import { dayLabel, formatWh } from '../utils/format';
import { ChartFigure, FillSwatch } from './chart-figure';
import { chartColours, chartInitialSize, chartTick } from './chart-palette';

const seriesNames = { harvestWh: 'Harvest into the stores', demandWh: 'Used by the devices' } as const;

function summaryOf(balance: KitEvaluation['dailyBalance']): string {
  const short = balance.filter((d) => d.harvestWh < d.demandWh).map((d) => d.dayIndex + 1);
  const mean = (f: (d: KitEvaluation['dailyBalance'][number]) => number) =>
    balance.reduce((sum, d) => sum + f(d), 0) / Math.max(1, balance.length);
  return `In the expected sky the panels put in ${formatWh(mean((d) => d.harvestWh))} a day on average against ${formatWh(mean((d) => d.demandWh))} used.${
    short.length
      ? ` Harvest falls short of use on day${short.length > 1 ? 's' : ''} ${short.join(', ')}.`
      : ' Harvest covers use every day.'
  }`;
}

/**
 * Each day of the expected sky: what the panels put into the stores (solid) against what the devices used (outlined).
 * Hatching is kept for dry days alone, so one pattern never means two things on the plan page.
 */
export function DailyBalanceChart({ balance }: { balance: KitEvaluation['dailyBalance'] }) {
  const rows = balance.map((d) => ({ day: dayLabel(d.dayIndex), harvestWh: d.harvestWh, demandWh: d.demandWh }));
  return (
    <ChartFigure
      title="Daily harvest against use"
      summary={summaryOf(balance)}
      legend={[
        { label: seriesNames.harvestWh, swatch: <FillSwatch colour={chartColours.stored} /> },
        { label: seriesNames.demandWh, swatch: <FillSwatch colour={chartColours.demand} outlined /> },
      ]}
    >
      <ResponsiveContainer width="100%" height="100%" initialDimension={chartInitialSize}>
        <BarChart data={rows} margin={{ top: 8, right: 12, bottom: 0, left: 0 }} barGap={2}>
          <CartesianGrid stroke={chartColours.grid} vertical={false} />
          <XAxis dataKey="day" tick={chartTick} tickLine={false} />
          <YAxis tick={chartTick} width={56} tickFormatter={(wh: number) => `${Math.round(wh)} Wh`} />
          <Tooltip
            formatter={(wh, key) => [formatWh(Number(wh)), seriesNames[key as keyof typeof seriesNames] ?? String(key)]}
          />
          <Bar dataKey="harvestWh" fill={chartColours.stored} isAnimationActive={false} />
          <Bar
            dataKey="demandWh"
            fill="#ffffff"
            stroke={chartColours.demand}
            strokeWidth={2}
            isAnimationActive={false}
          />
        </BarChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}
