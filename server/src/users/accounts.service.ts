import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { AccountRole, AccountUpdateInput } from '@gramwatt/shared';
import { and, asc, eq } from 'drizzle-orm';
import { CLOCK, type Clock } from '../common/clock';
import { isUniqueViolation } from '../common/database-errors';
import { DRIZZLE, type Database } from '../database/database.types';
import { type AccountRow, accounts } from '../database/schema';

export interface NewAccount {
  /** Already normalised (trimmed, lower-case) by the shared schema. */
  email: string;
  displayName: string;
  passwordHash: string;
  role?: AccountRole;
}

export const emailTakenMessage = 'An account with this e-mail already exists';
export const lastAdminMessage = 'The last active admin cannot be demoted or disabled';

/** Accounts: create, find, list, and change a role or the disabled flag under the last-admin rule. */
@Injectable()
export class AccountsService {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /** Creates an account; 409 when the e-mail is taken. */
  async create(input: NewAccount): Promise<AccountRow> {
    const now = this.clock.now();
    try {
      const [row] = await this.db
        .insert(accounts)
        .values({ ...input, email: input.email.toLowerCase(), createdAt: now, updatedAt: now })
        .returning();
      if (!row) throw new Error('insert returned no row');
      return row;
    } catch (error) {
      if (isUniqueViolation(error)) {
        throw new ConflictException({
          message: emailTakenMessage,
          errors: [{ path: 'email', message: emailTakenMessage }],
        });
      }
      throw error;
    }
  }

  async findById(id: string): Promise<AccountRow | undefined> {
    const [row] = await this.db.select().from(accounts).where(eq(accounts.id, id)).limit(1);
    return row;
  }

  async findByEmail(email: string): Promise<AccountRow | undefined> {
    const [row] = await this.db.select().from(accounts).where(eq(accounts.email, email.trim().toLowerCase())).limit(1);
    return row;
  }

  /** Every account, oldest first. */
  async list(): Promise<AccountRow[]> {
    return this.db.select().from(accounts).orderBy(asc(accounts.createdAt), asc(accounts.email));
  }

  /**
   * Changes an account's role and/or disabled flag. 404 when there is no such account; 409 when the change
   * would leave no active admin. The admin rows are locked for the check so two concurrent demotions
   * cannot both pass.
   */
  async update(id: string, change: AccountUpdateInput): Promise<AccountRow> {
    return this.db.transaction(async (tx) => {
      const activeAdmins = await tx
        .select({ id: accounts.id })
        .from(accounts)
        .where(and(eq(accounts.role, 'admin'), eq(accounts.disabled, false)))
        .orderBy(asc(accounts.id)) // one lock order for every transaction: no deadlock
        .for('update');
      const [current] = await tx.select().from(accounts).where(eq(accounts.id, id)).limit(1).for('update');
      if (!current) throw new NotFoundException('No such account');

      const nextRole = change.role ?? current.role;
      const nextDisabled = change.disabled ?? current.disabled;
      const wasActiveAdmin = current.role === 'admin' && !current.disabled;
      const staysActiveAdmin = nextRole === 'admin' && !nextDisabled;
      if (wasActiveAdmin && !staysActiveAdmin && activeAdmins.every((a) => a.id === id)) {
        throw new ConflictException(lastAdminMessage);
      }

      const [row] = await tx
        .update(accounts)
        .set({ role: nextRole, disabled: nextDisabled, updatedAt: this.clock.now() })
        .where(eq(accounts.id, id))
        .returning();
      if (!row) throw new NotFoundException('No such account');
      return row;
    });
  }
}
