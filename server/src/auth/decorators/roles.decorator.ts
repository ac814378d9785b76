import { SetMetadata } from '@nestjs/common';
import type { AccountRole } from '@gramwatt/shared';

export const ROLES_KEY = 'gramwatt:roles';

/** Limits a route (or a controller) to accounts with one of these roles; others get 403. */
export const Roles = (...roles: AccountRole[]) => SetMetadata(ROLES_KEY, roles);
