import { useId } from 'react';
import {
  CartesianGrid,
  Line,
  LineChart,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { DesignSkyId, KitEvaluation } from '../api/types';
import { dayStartMinutes, elapsedLabel, hoursPerDay, niceTicks, storedRows } from '../utils/chart-series';
import { formatWh, skyLabels } from '../utils/format';
import { ChartFigure, FillSwatch, LineSwatch } from './chart-figure';
import { chartColours, chartInitialSize, chartTick } from './chart-palette';
import { HatchPattern } from './hatch-pattern';

type Evaluation = Pick<KitEvaluation, 'storedSeries' | 'sunPaths' | 'ledgers' | 'bindingSkyId' | 'dayStrip'>;

const lineStyle = (skyId: DesignSkyId, bindingSkyId: DesignSkyId) =>
  skyId === bindingSkyId
    ? { stroke: chartColours.ink, strokeDasharray: undefined }
    : { stroke: chartColours.stored, strokeDasharray: '6 4' };

function summaryOf(evaluation: Evaluation): string {
  const parts = evaluation.ledgers.map((ledger) => {
    const first = ledger.days[0];
    const last = ledger.days[ledger.days.length - 1];
    return first && last
      ? `${skyLabels[ledger.skyId]}: from ${formatWh(first.storedStartWh)} to ${formatWh(last.storedEndWh)}`
      : '';
  });
  const dry = evaluation.dayStrip.filter((d) => d.dry).length;
  return `Energy stored in the kit and the devices, hour by hour. ${parts.filter(Boolean).join('; ')}.${dry ? ` Dry from day ${(evaluation.dayStrip.find((d) => d.dry)?.dayIndex ?? 0) + 1}.` : ''}`;
}

/** Stored energy through the trip, hour by hour: the binding sky solid, the expected sky dashed, dry days hatched. */
export function StoredEnergyChart({ evaluation }: { evaluation: Evaluation }) {
  const hatchId = useId().replace(/:/g, '');
  const rows = storedRows(evaluation);
  const startMinutes = dayStartMinutes(evaluation);
  const days = evaluation.dayStrip.length;
  const ticks = Array.from({ length: days + 1 }, (_, d) => d * hoursPerDay);
  const skies = evaluation.storedSeries.map((s) => s.skyId);
  const yTicks = niceTicks(Math.max(...rows.flatMap((row) => skies.map((skyId) => row[skyId] ?? 0))));
  return (
    <ChartFigure
      title="Stored energy through the trip"
      summary={summaryOf(evaluation)}
      legend={[
        ...skies.map((skyId) => {
          const style = lineStyle(skyId, evaluation.bindingSkyId);
          return {
            label: `${skyLabels[skyId]}${skyId === evaluation.bindingSkyId ? ' (the tightest)' : ''}`,
            swatch: <LineSwatch colour={style.stroke} dashed={style.strokeDasharray !== undefined} />,
          };
        }),
        ...(evaluation.dayStrip.some((d) => d.dry)
          ? [{ label: 'Dry day', swatch: <FillSwatch colour={chartColours.dry} hatched /> }]
          : []),
      ]}
    >
      <ResponsiveContainer width="100%" height="100%" initialDimension={chartInitialSize}>
        <LineChart data={rows} margin={{ top: 8, right: 12, bottom: 0, left: 0 }}>
          <defs>
            <HatchPattern id={hatchId} colour={chartColours.dry} />
          </defs>
          <CartesianGrid stroke={chartColours.grid} vertical={false} />
          {evaluation.dayStrip
            .filter((d) => d.dry)
            .map((d) => (
              <ReferenceArea
                key={d.dayIndex}
                x1={d.dayIndex * hoursPerDay}
                x2={(d.dayIndex + 1) * hoursPerDay}
                fill={`url(#${hatchId})`}
                fillOpacity={0.35}
                ifOverflow="hidden"
              />
            ))}
          <XAxis
            dataKey="elapsedH"
            type="number"
            domain={[0, days * hoursPerDay]}
            ticks={ticks.slice(0, -1).map((t) => t + hoursPerDay / 2)}
            tickFormatter={(h: number) => `Day ${Math.floor(h / hoursPerDay) + 1}`}
            tick={chartTick}
            tickLine={false}
          />
          <YAxis
            tick={chartTick}
            width={60}
            domain={[0, yTicks.at(-1) ?? 'auto']}
            ticks={yTicks}
            tickFormatter={(wh: number) => `${wh} Wh`}
          />
          {ticks.slice(1, -1).map((h) => (
            <ReferenceLine key={h} x={h} stroke={chartColours.grid} />
          ))}
          <Tooltip
            labelFormatter={(h) => elapsedLabel(Number(h), startMinutes)}
            formatter={(wh, skyId) => [formatWh(Number(wh)), skyLabels[skyId as DesignSkyId] ?? String(skyId)]}
          />
          {skies.map((skyId) => (
            <Line
              key={skyId}
              dataKey={skyId}
              name={skyId}
              type="monotone"
              dot={false}
              strokeWidth={2.5}
              isAnimationActive={false}
              connectNulls
              {...lineStyle(skyId, evaluation.bindingSkyId)}
            />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}
