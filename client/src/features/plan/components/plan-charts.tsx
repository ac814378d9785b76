import type { KitEvaluation } from '../api/types';
import { DailyBalanceChart } from './daily-balance-chart';
import { StoredEnergyChart } from './stored-energy-chart';
import { SunPathChart } from './sun-path-chart';

/** The plan's three charts; loaded on its own so the rest of the trip page does not wait for the chart library. */
export function PlanCharts({ evaluation }: { evaluation: KitEvaluation }) {
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <div className="lg:col-span-2">
        <StoredEnergyChart evaluation={evaluation} />
      </div>
      <DailyBalanceChart balance={evaluation.dailyBalance} />
      <SunPathChart paths={evaluation.sunPaths} />
    </div>
  );
}
