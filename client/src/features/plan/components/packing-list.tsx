import type { Trip } from '@gramwatt/shared';
import { useId, type ReactNode } from 'react';
import { formatDate } from '@/lib/format';
import type { ChosenKit } from '../api/types';
import { dayLabel, formatGrams, formatWh } from '../utils/format';
import { hopsOf, packsByCarrier, scheduleKindLabels, scheduleRows, sparesAmongLeads } from '../utils/packing';
import { CautionsList } from './cautions-list';
import { GramMeter } from './gram-meter';
import { VerdictSentence } from './verdict-sentence';

const sourceWords: Record<ChosenKit['source'], string> = {
  optimum: 'the lightest kit the planner found',
  swap: 'a swap from the plan',
  hand: 'a kit picked by hand',
};

/** A box to tick on paper. */
const Tick = () => (
  <span aria-hidden="true" className="mt-0.5 inline-block size-4 shrink-0 rounded-sm border-2 border-scree-500" />
);

function ListSection({ title, children }: { title: string; children: ReactNode }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="flex min-w-0 flex-col gap-2">
      <h3 id={headingId} className="text-base font-semibold text-scree-950">
        {title}
      </h3>
      {children}
    </section>
  );
}

export interface PackingListProps {
  chosen: ChosenKit;
  /** The trip's members: who carries the gear (the leader, or a party plan's carriers) and the devices. */
  members: Trip['members'];
  devices: Trip['devices'];
}

/** What to pack from the chosen kit, by carrier; the leads of every hop; the charging schedule; the cautions. */
export function PackingList({ chosen, members, devices }: PackingListProps) {
  const { kit, evaluation } = chosen;
  const hops = hopsOf(evaluation, kit.lines);
  const spares = sparesAmongLeads(evaluation, kit.lines);
  const rows = scheduleRows(evaluation, kit.lines);
  const packs = packsByCarrier(kit, members, devices);

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-col gap-1">
        <VerdictSentence verdict={evaluation.verdict} size="md" />
        <p className="text-sm text-scree-700">
          From {sourceWords[chosen.source]}, chosen {formatDate(chosen.updatedAt.slice(0, 10))}.
        </p>
      </div>

      {packs.map((pack) => (
        <ListSection
          key={pack.accountId ?? pack.name}
          title={`Carried by ${pack.name}${pack.role ? ` (${pack.role})` : ''}`}
        >
          {pack.lines.length > 0 && pack.kit && (
            <>
              <div
                role="region"
                aria-label={`Power gear ${pack.name} packs (scrolls sideways)`}
                tabIndex={0}
                className="overflow-x-auto"
              >
                <table className="w-full table-fixed text-left text-sm sm:text-base">
                  <caption className="sr-only">Power gear {pack.name} packs</caption>
                  <colgroup>
                    <col />
                    <col className="w-16 sm:w-24" />
                    <col className="w-20 sm:w-28" />
                  </colgroup>
                  <thead className="border-b-2 border-scree-200 text-sm text-scree-600">
                    <tr>
                      <th scope="col" className="py-1.5 pr-3 font-medium">
                        Power gear
                      </th>
                      <th scope="col" className="py-1.5 pr-3 text-right font-medium">
                        Count
                      </th>
                      <th scope="col" className="py-1.5 text-right font-medium">
                        Grams
                      </th>
                    </tr>
                  </thead>
                  <tbody>
                    {pack.lines.map((line) => (
                      <tr key={line.itemId} className="border-b border-firn-200">
                        <th scope="row" className="py-1.5 pr-3 font-medium text-scree-950">
                          <span className="flex items-start gap-2">
                            <Tick />
                            {line.name}
                          </span>
                        </th>
                        <td className="py-1.5 pr-3 text-right tabular-nums">× {line.count}</td>
                        <td className="py-1.5 text-right whitespace-nowrap tabular-nums">{formatGrams(line.massG)}</td>
                      </tr>
                    ))}
                  </tbody>
                  <tfoot>
                    <tr className="font-semibold">
                      <th scope="row" colSpan={2} className="py-1.5 pr-3">
                        Power gear in all
                      </th>
                      <td className="py-1.5 text-right whitespace-nowrap tabular-nums">
                        {formatGrams(pack.kit.massG)}
                      </td>
                    </tr>
                  </tfoot>
                </table>
              </div>
              <GramMeter kit={pack.kit} />
            </>
          )}
          {pack.devices.length > 0 && (
            <div className="mt-2">
              <p className="text-sm font-medium text-scree-800">
                Devices ({formatGrams(pack.devices.reduce((sum, d) => sum + d.massG, 0))}, carried anyway and not in the
                gear&rsquo;s grams)
              </p>
              <ul className="mt-1 flex flex-col gap-1">
                {pack.devices.map((device) => (
                  <li key={device.id} className="flex items-start gap-2 text-scree-900">
                    <Tick />
                    <span>
                      {device.name} <span className="text-sm text-scree-600">· {formatGrams(device.massG)}</span>
                    </span>
                  </li>
                ))}
              </ul>
            </div>
          )}
        </ListSection>
      ))}

      <ListSection title="Leads for each hop">
        {hops.length === 0 ? (
          <p className="text-scree-700">This kit has no charging hops to join.</p>
        ) : (
          <ul className="flex flex-col gap-1.5">
            {hops.map((hop) => (
              <li
                key={`${hop.kind}|${hop.from}|${hop.to}|${hop.via ?? ''}|${hop.leads.join()}`}
                className="text-scree-900"
              >
                <span className="font-medium">
                  {hop.from} → {hop.via ? `${hop.via} → ` : ''}
                  {hop.to}
                </span>
                : {hop.leads.length ? hop.leads.join(' and ') : 'no lead: a fixed cable joins them'}
              </li>
            ))}
          </ul>
        )}
        {spares.length > 0 && (
          <p className="text-sm text-scree-700">
            Also in the kit, for no hop of the schedule: {spares.map((s) => s.name).join(', ')}.
          </p>
        )}
      </ListSection>

      <ListSection title="Charging schedule">
        <p className="text-sm text-scree-700">
          Times are local to the trip; energies in Wh, in the expected sky. Sun into a bank or a 12 V pack while walking
          or at camp; top-ups from a bank or pack at camp; a radio run live draws straight from its pack.
        </p>
        {rows.length === 0 ? (
          <p className="text-scree-700">Nothing needs charging on this trip.</p>
        ) : (
          <div
            role="region"
            aria-label="Charging schedule (scrolls sideways)"
            tabIndex={0}
            className="overflow-x-auto rounded-lg border-2 border-firn-200 bg-white"
          >
            <table className="w-full min-w-[36rem] text-left text-sm">
              <caption className="sr-only">Charging schedule, local time</caption>
              <thead className="bg-firn-100 text-scree-700">
                <tr>
                  <th scope="col" className="px-3 py-1.5 font-medium">
                    Day
                  </th>
                  <th scope="col" className="px-3 py-1.5 font-medium">
                    When
                  </th>
                  <th scope="col" className="px-3 py-1.5 font-medium">
                    What charges from what
                  </th>
                  <th scope="col" className="px-3 py-1.5 text-right font-medium">
                    Energy
                  </th>
                </tr>
              </thead>
              <tbody>
                {rows.map((row, i) => (
                  <tr key={i} className="border-t border-firn-200 align-top">
                    <td className="px-3 py-1.5 whitespace-nowrap">{dayLabel(row.dayIndex)}</td>
                    <td className="px-3 py-1.5 whitespace-nowrap tabular-nums">
                      {row.start}–{row.end.time}
                      {(row.startsNextMorning || row.end.daysLater > 0) && (
                        <span className="block text-xs text-scree-600">
                          {row.startsNextMorning ? 'the next morning' : 'ends the next morning'}
                        </span>
                      )}
                    </td>
                    <td className="px-3 py-1.5">
                      <span className="text-scree-600">{scheduleKindLabels[row.kind]}</span>
                      {row.to} from {row.from}
                      {row.via && <span className="text-scree-600"> via {row.via}</span>}
                    </td>
                    <td className="px-3 py-1.5 text-right whitespace-nowrap tabular-nums">{formatWh(row.energyWh)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </ListSection>

      <ListSection title="Cautions">
        <CautionsList cautions={evaluation.cautions} />
      </ListSection>
    </div>
  );
}
