import type { Account, AccountRole } from '@gramwatt/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { cn } from '@/components/ui/cn';
import { Dialog } from '@/components/ui/dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { Select, type SelectOption } from '@/components/ui/select';
import { PageSpinner } from '@/components/ui/spinner';
import { isApiError } from '@/lib/api-client';
import { useAccount } from '@/lib/auth';
import { useAccounts } from '../api/get-accounts';
import { useUpdateAccount, type UpdateAccountInput } from '../api/update-account';

const roleOptions: readonly SelectOption<AccountRole>[] = [
  { value: 'member', label: 'Member' },
  { value: 'admin', label: 'Admin' },
];

const roleLabel = (role: AccountRole) => roleOptions.find((option) => option.value === role)?.label ?? role;

const joinedFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

type Outcome = { tone: 'error' | 'done'; title: string; message: string };

/** Every account with its role and whether it may sign in; an admin changes either here. */
export function AccountsTable() {
  const accounts = useAccounts();
  const me = useAccount().data;
  const updateAccount = useUpdateAccount();
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [toDisable, setToDisable] = useState<Account | null>(null);

  const change = (account: Account, input: UpdateAccountInput, doneMessage: string) => {
    setOutcome(null);
    updateAccount.mutate(input, {
      onSuccess: () => setOutcome({ tone: 'done', title: 'Saved', message: doneMessage }),
      onError: (error) =>
        setOutcome({
          tone: 'error',
          title: isApiError(error, 409) ? 'Change refused' : `Could not change ${account.displayName}`,
          message: error.message,
        }),
    });
  };

  if (accounts.isPending) return <PageSpinner label="Loading accounts" />;
  if (accounts.isError)
    return (
      <Alert tone="error" title="Could not load the accounts">
        {accounts.error.message}
      </Alert>
    );
  if (accounts.data.length === 0) return <EmptyState title="No accounts yet" />;

  const pending = updateAccount.isPending ? updateAccount.variables : undefined;

  return (
    <div className="flex flex-col gap-4">
      <div aria-live="polite">
        {outcome && (
          <Alert tone={outcome.tone} title={outcome.title}>
            {outcome.message}
          </Alert>
        )}
      </div>
      {/* Focusable so keyboard users can scroll the table sideways on a phone. */}
      <div
        tabIndex={0}
        role="region"
        aria-label="Accounts table"
        className="relative overflow-x-auto rounded-xl border-2 border-scree-200 bg-white shadow-card"
      >
        {/* On a phone each account becomes a small card: name and e-mail on top, role and sign-in below. */}
        <table className="w-full border-collapse text-left text-sm max-md:block md:min-w-[40rem]">
          <caption className="sr-only">Accounts, with their role and whether they can sign in</caption>
          <thead className="bg-firn-100 text-scree-700 max-md:sr-only">
            <tr>
              <th scope="col" className="px-4 py-3 font-semibold">
                Name
              </th>
              <th scope="col" className="px-4 py-3 font-semibold">
                E-mail
              </th>
              <th scope="col" className="px-4 py-3 font-semibold">
                Role
              </th>
              <th scope="col" className="px-4 py-3 font-semibold">
                Sign-in
              </th>
              <th scope="col" className="px-4 py-3 font-semibold">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody className="divide-y-2 divide-firn-200 max-md:block">
            {accounts.data.map((account) => {
              const isMe = account.id === me?.id;
              const isBusy = pending?.accountId === account.id;
              const shownRole = (isBusy && pending?.data.role) || account.role;
              return (
                <tr
                  key={account.id}
                  className={cn(
                    'max-md:grid max-md:grid-cols-[auto_1fr_auto] max-md:items-center max-md:gap-x-4 max-md:gap-y-2 max-md:p-4',
                    account.disabled ? 'text-scree-600' : 'text-scree-900',
                  )}
                >
                  <th scope="row" className="px-4 py-3 font-medium max-md:col-span-3 max-md:p-0">
                    {account.displayName}
                    {isMe && <span className="font-normal text-scree-600"> (you)</span>}
                    <span className="block text-xs font-normal text-scree-600">
                      Joined {joinedFormat.format(new Date(account.createdAt))}
                    </span>
                  </th>
                  <td className="px-4 py-3 break-all max-md:col-span-3 max-md:p-0">{account.email}</td>
                  <td className="px-4 py-3 max-md:p-0">
                    <Select
                      aria-label={`Role of ${account.displayName}`}
                      options={roleOptions}
                      value={shownRole}
                      disabled={isBusy}
                      onValueChange={(role) =>
                        change(
                          account,
                          { accountId: account.id, data: { role } },
                          `${account.displayName} is now ${roleLabel(role).toLowerCase()}.`,
                        )
                      }
                    />
                  </td>
                  <td className="px-4 py-3 max-md:p-0 max-md:before:text-scree-600 max-md:before:content-['Sign-in:_']">
                    {account.disabled ? 'Disabled' : 'Allowed'}
                  </td>
                  <td className="px-4 py-3 text-right max-md:p-0">
                    {account.disabled ? (
                      <Button
                        variant="secondary"
                        size="sm"
                        disabled={isBusy}
                        aria-label={`Enable ${account.displayName}`}
                        onClick={() =>
                          change(
                            account,
                            { accountId: account.id, data: { disabled: false } },
                            `${account.displayName} can sign in again.`,
                          )
                        }
                      >
                        Enable
                      </Button>
                    ) : (
                      <Button
                        variant="secondary"
                        size="sm"
                        disabled={isBusy}
                        aria-label={`Disable ${account.displayName}`}
                        onClick={() => setToDisable(account)}
                      >
                        Disable
                      </Button>
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <Dialog
        open={toDisable !== null}
        onClose={() => setToDisable(null)}
        title={`Disable ${toDisable?.displayName ?? 'this account'}?`}
        description="They are signed out on their next request and cannot sign in until an admin enables the account again. Their locker and trips are kept."
        actions={
          <>
            <Button variant="secondary" data-autofocus onClick={() => setToDisable(null)}>
              Keep allowed
            </Button>
            <Button
              variant="danger"
              onClick={() => {
                if (toDisable)
                  change(
                    toDisable,
                    { accountId: toDisable.id, data: { disabled: true } },
                    `${toDisable.displayName} can no longer sign in.`,
                  );
                setToDisable(null);
              }}
            >
              Disable account
            </Button>
          </>
        }
      />
    </div>
  );
}
