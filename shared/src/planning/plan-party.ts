import { kitCounts } from '../optimisation/kit.js';
import type { KitCounts, OptimiseAnswer, PathAlternative } from '../optimisation/types.js';
import { bestSplit, optimisePartyKit, type PartyOptions } from '../party/party-kit.js';
import type { KitSplit, PartyAnswer, PartyProblem, WalkingFeed } from '../party/types.js';
import type { BankSpec, UsbPanelSpec } from '../schemas/items.js';
import type { PlanCarrier, PlanKitLine, PlanResult } from '../schemas/plans.js';
import { joinPorts, type KitLead } from '../simulation/connections.js';
import type { PlanningContext } from './build-problem.js';
import { gramsText, listText } from './plain-words.js';
import { planTrip, type PlanOptions } from './plan-trip.js';
import type { PartyPlanning, PlanningGear, PlanningInput } from './planning-input.js';

/**
 * The walking rule's feeds for the pooled gear: for each USB panel, every bank its plug fits directly, or with one lead
 * whose ends join them (the same hop rule as the simulation's, `joinPorts`).
 * @example walkingFeedsOf(gear)[0].alternatives // [{ itemIds: ['bank-1'] }, { itemIds: ['bank-2', 'lead-1'] }]
 */
export function walkingFeedsOf(gear: readonly PlanningGear[]): WalkingFeed[] {
  const owned = gear.filter((g) => g.countOwned > 0);
  const banks = owned.filter((g): g is PlanningGear & { spec: BankSpec } => g.spec.kind === 'bank');
  const leads: KitLead[] = owned.flatMap((g) => (g.spec.kind === 'lead' ? [{ itemId: g.itemId, spec: g.spec }] : []));
  return (
    owned
      // USB panels fill banks; a 12 V panel's walking feed (controller and battery) joins when the 12 V path is planned.
      .filter((g): g is PlanningGear & { spec: UsbPanelSpec } => g.spec.kind === 'panel' && g.spec.panelType === 'usb')
      .map((panel) => ({
        panelItemId: panel.itemId,
        alternatives: banks.flatMap((bank): PathAlternative[] => {
          if (joinPorts(panel.spec.outputPort, bank.spec.inputPort, []).joined) return [{ itemIds: [bank.itemId] }];
          return leads
            .filter((lead) => {
              const hop = joinPorts(panel.spec.outputPort, bank.spec.inputPort, [lead]);
              return hop.joined && hop.leadItemId === lead.itemId;
            })
            .map((lead) => ({ itemIds: [bank.itemId, lead.itemId] }));
        }),
      }))
  );
}

/** The party's problem for a planning context: the pooled candidates and daily model, carriers, owners, feeds. */
export function partyProblemOf(context: PlanningContext, party: PartyPlanning): PartyProblem {
  return {
    problem: context.problem,
    carriers: party.members.map((m) => ({ memberId: m.memberId, gramLimitG: m.gramLimitG })),
    ownerByItemId: new Map(Object.entries(party.ownerByItemId)),
    walkingFeeds: walkingFeedsOf(context.input.gear),
    tripLimitG: context.input.gramLimitG,
  };
}

/** The optimiser's answer shape for planTrip: over the limits reads as over a limit of Σ limits. */
function asOptimiseAnswer(answer: PartyAnswer): OptimiseAnswer {
  switch (answer.status) {
    case 'nothing-feasible':
      return { ...answer.answer, stats: answer.stats, notes: answer.notes };
    case 'optimal':
      return { status: 'optimal', kit: answer.kit, stats: answer.stats, notes: answer.notes };
    case 'best-so-far':
      return { status: 'best-so-far', kit: answer.kit, lowerBoundG: 0, stats: answer.stats, notes: answer.notes };
    case 'over-limits':
      return {
        status: 'over-limit',
        kit: answer.kit,
        gramLimitG: answer.partyLimitG ?? answer.kit.massG,
        overLimitG: answer.split.overG,
        stats: answer.stats,
        notes: answer.notes,
      };
  }
}

/** A split as the plan shows it: the carriers' lines with names, kinds and grams. */
function planCarriers(context: PlanningContext, party: PartyPlanning, split: KitSplit): PlanCarrier[] {
  const names = new Map(party.members.map((m) => [m.memberId, m.name]));
  return split.carriers.map((c) => ({
    memberId: c.memberId,
    name: names.get(c.memberId) ?? c.memberId,
    lines: c.lines.map((l): PlanKitLine => {
      const g = context.gearById.get(l.itemId);
      const unitMassG = Math.round(g?.massG ?? 0);
      return {
        itemId: l.itemId,
        name: g?.name ?? l.itemId,
        kind: g?.spec.kind ?? 'other',
        count: l.count,
        unitMassG,
        massG: unitMassG * l.count,
      };
    }),
    massG: c.massG,
    gramLimitG: c.gramLimitG,
    overG: c.overG,
  }));
}

/**
 * Who carries what of a kit in a party (the best split under the walking rule): for a kit chosen by hand or a swap.
 * @example partyCarriers(context, party, counts).map((c) => c.massG) // [640, 410]
 */
export function partyCarriers(context: PlanningContext, party: PartyPlanning, counts: KitCounts): PlanCarrier[] {
  return planCarriers(context, party, bestSplit(partyProblemOf(context, party), counts));
}

/** "Wren would carry 1,020 g, 120 g over a 900 g limit" for each person over. */
function overageText(carriers: readonly PlanCarrier[]): string {
  const over = carriers.filter((c) => c.overG > 0);
  return listText(
    over.map(
      (c) =>
        `${c.name} would carry ${gramsText(c.massG)}, ${gramsText(c.overG)} over a ${gramsText(c.gramLimitG ?? 0)} limit`,
    ),
  );
}

/**
 * Plans a party's trip: `planTrip` over the pooled gear, with the kit chosen by the party solver — the lightest kit
 * that keeps every device charged and that the carriers can share within their own gram limits under the walking rule
 * (see party/types.ts) — and who carries what on the kit and on each swap. When no kit can be shared within the
 * limits, the status is `over-limit`, the kit is the lightest that works, and the headline names whose limit is
 * exceeded and by how much.
 * @example planParty(input, party).kit?.carriers?.map((c) => c.name) // ['Wren', 'Tamsin']
 */
export function planParty(
  input: PlanningInput,
  party: PartyPlanning,
  options: PlanOptions & PartyOptions = {},
): PlanResult {
  if (party.members.length === 0) throw new Error('a party plan needs at least one carrier');
  let chosen: { context: PlanningContext; answer: PartyAnswer } | null = null;
  const result = planTrip(input, {
    ...options,
    chooseKit: (context, search, searchOptions) => {
      const answer = optimisePartyKit(
        partyProblemOf(context, party),
        context.judge,
        { ...options, ...searchOptions },
        search,
      );
      chosen = { context, answer };
      return asOptimiseAnswer(answer);
    },
  });
  const picked = chosen as { context: PlanningContext; answer: PartyAnswer } | null;
  if (!picked || picked.answer.status === 'nothing-feasible' || !result.kit) return result;
  const { context, answer } = picked;
  const problem = partyProblemOf(context, party);
  const splitOf = (counts: KitCounts): PlanCarrier[] =>
    planCarriers(context, party, bestSplit(problem, counts, options));
  const carriers = planCarriers(context, party, answer.split);
  const headline =
    answer.status === 'over-limits'
      ? answer.overTripLimitG > 0
        ? `Nothing that works fits under the trip’s ${gramsText(context.input.gramLimitG ?? 0)}: the lightest kit that does weighs ${gramsText(answer.kit.massG)}, ${gramsText(answer.overTripLimitG)} over${carriers.some((c) => c.overG > 0) ? `, and at best ${overageText(carriers)}` : ''}.`
        : answer.split.walkingRuleHeld && carriers.some((c) => c.overG > 0)
          ? `No kit that works can be shared within everyone’s limits: the lightest that does weighs ${gramsText(answer.kit.massG)}, and at best ${overageText(carriers)}.`
          : `No kit that works can be shared so that every panel rides with a bank it can fill; the lightest that works weighs ${gramsText(answer.kit.massG)}.`
      : answer.status === 'optimal'
        ? `The lightest kit the party can share within everyone’s limits weighs ${gramsText(answer.kit.massG)}. ${result.evaluation?.verdict.text ?? ''}`.trim()
        : result.headline;
  return {
    ...result,
    headline,
    kit: { ...result.kit, carriers },
    swaps: result.swaps.map((swap) => ({
      ...swap,
      kit: { ...swap.kit, carriers: splitOf(kitCounts(swap.kit.lines)) },
    })),
  };
}
