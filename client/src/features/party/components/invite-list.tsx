import type { Invite } from '@gramwatt/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Spinner } from '@/components/ui/spinner';
import { useInvites } from '../api/get-invites';
import { useWithdrawInvite } from '../api/withdraw-invite';
import { describeInvite, describeMail, roleLabel } from '../utils/party-format';

/** Pending invites come first; answered, withdrawn and expired ones stay listed below them for the record. */
export function InviteList({ tripId }: { tripId: string }) {
  const invites = useInvites(tripId);
  const withdraw = useWithdrawInvite();
  const [message, setMessage] = useState<{ tone: 'done' | 'error'; text: string } | null>(null);

  if (invites.isPending) return <Spinner label="Loading the invites" />;
  if (invites.isError)
    return (
      <Alert tone="error" title="The invites could not be loaded">
        {invites.error.message}
      </Alert>
    );

  const pending = invites.data.filter((invite) => invite.state === 'pending');
  const settled = invites.data.filter((invite) => invite.state !== 'pending');

  const withdrawOne = (invite: Invite) => {
    setMessage(null);
    withdraw.mutate(
      { tripId, inviteId: invite.id },
      {
        onSuccess: () => setMessage({ tone: 'done', text: `The invite to ${invite.email} no longer works.` }),
        onError: (error) => setMessage({ tone: 'error', text: error.message }),
      },
    );
  };

  return (
    <div className="flex flex-col gap-3">
      <h3 className="font-semibold text-scree-950">Invites</h3>
      <div aria-live="polite">{message && <Alert tone={message.tone}>{message.text}</Alert>}</div>
      {invites.data.length === 0 && <p className="text-scree-700">No invites sent yet.</p>}
      {pending.length > 0 && (
        <ul aria-label="Waiting for an answer" className="flex flex-col gap-2">
          {pending.map((invite) => (
            <li
              key={invite.id}
              className="flex flex-col gap-2 rounded-lg border-2 border-scree-200 bg-white p-3 sm:flex-row sm:items-center sm:justify-between"
            >
              <div className="min-w-0">
                <p className="font-medium break-all text-scree-950">
                  {invite.email}{' '}
                  <span className="font-normal text-scree-700">as {roleLabel[invite.role].toLowerCase()}</span>
                </p>
                <p className="text-sm text-scree-700">{describeInvite(invite)}</p>
                <p className="text-sm text-scree-600">{describeMail(invite.mail)}</p>
              </div>
              <Button
                variant="secondary"
                size="sm"
                className="self-start sm:self-center"
                isLoading={withdraw.isPending && withdraw.variables.inviteId === invite.id}
                onClick={() => withdrawOne(invite)}
              >
                Withdraw<span className="sr-only"> the invite to {invite.email}</span>
              </Button>
            </li>
          ))}
        </ul>
      )}
      {settled.length > 0 && (
        <details className="rounded-lg border-2 border-firn-200 bg-firn-100 px-3 py-2">
          <summary className="min-h-9 cursor-pointer py-1.5 text-sm font-medium text-scree-800">
            Earlier invites ({settled.length})
          </summary>
          <ul className="mt-2 flex flex-col gap-2 pb-1 text-sm">
            {settled.map((invite) => (
              <li key={invite.id} className="break-all text-scree-800">
                {invite.email} as {roleLabel[invite.role].toLowerCase()} — {describeInvite(invite)}
              </li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}
