import type { InviteRole, TripMember } from '@gramwatt/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Select } from '@/components/ui/select';
import { Spinner } from '@/components/ui/spinner';
import { useMembers } from '../api/get-members';
import { useRemoveMember } from '../api/remove-member';
import { useUpdateMember } from '../api/update-member';
import { formatGramLimit, inviteRoleOptions, roleLabel } from '../utils/party-format';
import { GramLimitEditor } from './gram-limit-editor';

export interface MemberListProps {
  tripId: string;
  /** The signed-in account, to mark "you". */
  myAccountId: string | undefined;
  /** Whether the controls for role, limit and removal show (the leader's). */
  canManage: boolean;
}

type Outcome = { tone: 'done' | 'error'; text: string };

/** Leaders first, then partners, then viewers; the order they joined within each. */
const roleOrder = { leader: 0, partner: 1, viewer: 2 } as const;
const byRole = (a: TripMember, b: TripMember) =>
  roleOrder[a.role] - roleOrder[b.role] || a.joinedAt.localeCompare(b.joinedAt);

function MemberCard({
  tripId,
  member,
  isMe,
  canManage,
  onOutcome,
  onRemove,
}: {
  tripId: string;
  member: TripMember;
  isMe: boolean;
  canManage: boolean;
  onOutcome: (outcome: Outcome) => void;
  onRemove: (member: TripMember) => void;
}) {
  const update = useUpdateMember();
  const busy = update.isPending;
  const limitError =
    update.isError && update.variables.data.gramLimitG !== undefined ? update.error.message : undefined;
  const name = `${member.displayName}${isMe ? ' (you)' : ''}`;
  // While a role change is on its way, show the role asked for (the leader's own role never changes here).
  const shownRole: InviteRole =
    (busy && update.variables.data.role) || (member.role === 'viewer' ? 'viewer' : 'partner');

  const save = (data: Parameters<typeof update.mutate>[0]['data'], done: string) =>
    update.mutate(
      { tripId, accountId: member.accountId, data },
      {
        onSuccess: () => onOutcome({ tone: 'done', text: done }),
        onError: (error) => onOutcome({ tone: 'error', text: `${member.displayName}: ${error.message}` }),
      },
    );

  return (
    <li className="rounded-xl border-2 border-scree-200 bg-white p-4">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h3 className="font-semibold text-scree-950">{name}</h3>
        {!(canManage && member.role !== 'leader') && <p className="text-scree-800">{roleLabel[member.role]}</p>}
      </div>
      <p className="text-sm break-all text-scree-600">{member.email}</p>
      {!canManage && (
        <p className="mt-2 text-scree-800">
          <span className="text-scree-600">Gram limit: </span>
          {formatGramLimit(member.gramLimitG)}
        </p>
      )}
      {canManage && (
        <div className="mt-3 flex flex-col gap-4 sm:flex-row sm:flex-wrap sm:items-start sm:gap-6">
          {member.role !== 'leader' && (
            <label className="flex flex-col gap-1.5 text-sm font-medium text-scree-900">
              Role<span className="sr-only"> of {member.displayName}</span>
              <Select
                options={inviteRoleOptions}
                value={shownRole}
                disabled={busy}
                onValueChange={(role) =>
                  save({ role }, `${member.displayName} is now a ${roleLabel[role].toLowerCase()}.`)
                }
                className="min-h-11 w-40 font-normal"
              />
            </label>
          )}
          <GramLimitEditor
            key={String(member.gramLimitG)}
            memberName={member.displayName}
            gramLimitG={member.gramLimitG}
            isSaving={busy && update.variables.data.gramLimitG !== undefined}
            serverError={limitError}
            onSave={(gramLimitG) =>
              save(
                { gramLimitG },
                `${member.displayName}: ${gramLimitG === null ? 'no own gram limit' : `gram limit ${gramLimitG} g`}.`,
              )
            }
          />
          {member.role !== 'leader' && (
            <Button
              variant="quiet"
              className="self-start text-rosehip-700 sm:mt-7 sm:ml-auto"
              onClick={() => onRemove(member)}
            >
              Remove<span className="sr-only"> {member.displayName}</span> from the trip
            </Button>
          )}
        </div>
      )}
    </li>
  );
}

/** Everyone on the trip with their role and own gram limit; the leader changes either, or removes someone. */
export function MemberList({ tripId, myAccountId, canManage }: MemberListProps) {
  const members = useMembers(tripId);
  const remove = useRemoveMember();
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [toRemove, setToRemove] = useState<TripMember | null>(null);

  const confirmRemove = () => {
    if (!toRemove) return;
    const member = toRemove;
    remove.mutate(
      { tripId, accountId: member.accountId },
      {
        onSuccess: () => {
          setToRemove(null);
          setOutcome({ tone: 'done', text: `${member.displayName} is off the trip, with the devices they brought.` });
        },
        onError: (error) => {
          setToRemove(null);
          setOutcome({ tone: 'error', text: `${member.displayName} could not be removed: ${error.message}` });
        },
      },
    );
  };

  return (
    <section aria-labelledby="party-members-heading" className="flex flex-col gap-3">
      <h2 id="party-members-heading" className="text-lg font-semibold text-scree-900">
        Who is going
      </h2>
      <div aria-live="polite">
        {outcome && (
          <Alert tone={outcome.tone} title={outcome.tone === 'done' ? 'Saved' : 'Not changed'}>
            {outcome.text}
          </Alert>
        )}
      </div>
      {members.isPending && <Spinner label="Loading the party" />}
      {members.isError && (
        <Alert tone="error" title="The party could not be loaded">
          {members.error.message}
        </Alert>
      )}
      {members.isSuccess && (
        <ul className="flex flex-col gap-3">
          {[...members.data].sort(byRole).map((member) => (
            <MemberCard
              key={member.accountId}
              tripId={tripId}
              member={member}
              isMe={member.accountId === myAccountId}
              canManage={canManage}
              onOutcome={setOutcome}
              onRemove={setToRemove}
            />
          ))}
        </ul>
      )}
      <Dialog
        open={toRemove !== null}
        onClose={() => !remove.isPending && setToRemove(null)}
        title={toRemove ? `Remove ${toRemove.displayName} from the trip?` : 'Remove from the trip?'}
        description="They lose access at once, and the devices they brought from their locker leave the trip. You can invite them again later."
        actions={
          <>
            <Button variant="secondary" data-autofocus onClick={() => setToRemove(null)} disabled={remove.isPending}>
              Keep them
            </Button>
            <Button variant="danger" onClick={confirmRemove} isLoading={remove.isPending}>
              Remove
            </Button>
          </>
        }
      />
    </section>
  );
}
