/** Planning: a trip and its gear turned into the optimiser's problem, the plan the solver answers, and hand checks. */
export * from './planning-input.js';
export { planningContext, type PlanningContext } from './build-problem.js';
export { evaluateKit, planKit } from './evaluate-kit.js';
export { planModelVersion } from './model-version.js';
export { planTrip, type PlanOptions } from './plan-trip.js';
export { checkKit } from './check-kit.js';
export { warmUpPlanner } from './warm-up.js';
export { planParty, partyCarriers, partyProblemOf, walkingFeedsOf } from './plan-party.js';
