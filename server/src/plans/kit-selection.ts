import { BadRequestException } from '@nestjs/common';
import type { ApiFieldError, KitSelection, PlanningInput } from '@gramwatt/shared';

/**
 * What is wrong with a kit picked for a trip, by field path: an item that is not among the trip's candidate gear
 * (unknown, a device, or someone else's — not told apart) or more units than owned. The engine's `checkKit` says
 * the same; asking here first spares a solver thread.
 */
export function kitSelectionErrors(input: PlanningInput, selection: KitSelection): ApiFieldError[] {
  const gearById = new Map(input.gear.map((g) => [g.itemId, g]));
  return selection.flatMap((line, i): ApiFieldError[] => {
    const gear = gearById.get(line.itemId);
    if (!gear) return [{ path: `kit.${i}.itemId`, message: 'This item is not among the gear for this trip' }];
    if (line.count > gear.countOwned)
      return [{ path: `kit.${i}.count`, message: `Only ${gear.countOwned} of ${gear.name} owned` }];
    return [];
  });
}

/** @throws BadRequestException (400) with the field paths when the selection does not fit the trip's gear. */
export function assertKitSelection(input: PlanningInput, selection: KitSelection): void {
  const errors = kitSelectionErrors(input, selection);
  if (errors.length > 0) {
    throw new BadRequestException({
      message: errors.length === 1 ? errors[0]?.message : 'Some fields need attention',
      errors,
    });
  }
}
