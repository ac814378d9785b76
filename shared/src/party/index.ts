/**
 * The party: pooled gear shared out among the carriers within each person's own gram limit, under the walking rule
 * (see types.ts), on top of the kit optimiser.
 */
export * from './types.js';
export { splitKit, defaultSplitNodeBudget, type SplitOptions } from './split-kit.js';
export { optimisePartyKit, bestSplit, partyLimitG, defaultPartyRounds, type PartyOptions } from './party-kit.js';
