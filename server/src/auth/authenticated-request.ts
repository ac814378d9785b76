import type { Request } from 'express';
import type { AccountRow } from '../database/schema';

/** A request after the JWT guard: `user` is the account loaded from the database for this request. */
export type AuthenticatedRequest = Request & { user: AccountRow };

/** A request that may or may not carry a session. */
export type MaybeAuthenticatedRequest = Request & { user?: AccountRow };
