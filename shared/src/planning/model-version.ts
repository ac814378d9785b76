/**
 * Version of the model and rules behind a plan, stored with each plan so a plan weighed by an earlier planner can be
 * told apart (the Plan tab says so and offers to plan again). Raised whenever the same trip and gear can get a
 * different answer: 2 — camp top-ups in rounds by hours held and harvest tiers in the simulation's dispatch, and a
 * core of the locker searched first on large lockers; 3 — the units of one item drawn together, and a device charged no
 * faster than the fastest path of any one store (one socket, one cable at a time), not the stores' rates added up; and
 * a kit judged as working when it works with a shadowed converter left home; 4 — a kit that runs dry as packed tried
 * without its most efficient spare converter and without every spare, not with every set of spares left home; 5 — the
 * camp top-up rounds at shares of the kit's own hour unit (the fewest hours a full device battery holds), not at fixed
 * hours, so a rise of every device's use moves no round's target; 6 — the rounds past that unit run only in the last
 * 2 h of a camp window; 7 — no rounds: one top-up pass per camp step in the trip's order (to 1.5 hour units early in
 * camp, 2 in the hour before the last, the target in the last hour), and each step's harvest after its top-ups.
 */
export const planModelVersion = 'gramwatt-plan-7';
