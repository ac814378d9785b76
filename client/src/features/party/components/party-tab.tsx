import type { TripRole } from '@gramwatt/shared';
import { useAccount } from '@/lib/auth';
import { useMembers } from '../api/get-members';
import { roleForYou } from '../utils/party-format';
import { InviteForm } from './invite-form';
import { InviteList } from './invite-list';
import { MemberList } from './member-list';
import { PoolPanel } from './pool-panel';
import { SendHomePanel } from './send-home-panel';
import { ShareLinkPanel } from './share-link-panel';

export interface PartyTabProps {
  tripId: string;
}

const cardClasses = 'flex flex-col gap-6 rounded-xl border-2 border-scree-200 bg-firn-100 p-4 sm:p-6';

/**
 * The trip's party: who is going with their roles and gram limits, and the gear they share; for the leader,
 * invites, the read-only link and sending the plan home. Partners share their own gear; viewers only read.
 */
export function PartyTab({ tripId }: PartyTabProps) {
  const me = useAccount().data;
  const members = useMembers(tripId);
  const myRole: TripRole | undefined = members.data?.find((member) => member.accountId === me?.id)?.role;
  const isLeader = myRole === 'leader';

  return (
    <div className="flex flex-col gap-8">
      {myRole && !isLeader && (
        <p className="max-w-prose text-scree-800">
          {roleForYou[myRole]} The leader brings people in, sets gram limits and sends the plan home.
        </p>
      )}
      <MemberList tripId={tripId} myAccountId={me?.id} canManage={isLeader} />
      {myRole && <PoolPanel tripId={tripId} myAccountId={me?.id} myRole={myRole} />}
      {isLeader && (
        <section aria-labelledby="party-invites-heading" className={cardClasses}>
          <h2 id="party-invites-heading" className="text-lg font-semibold text-scree-900">
            Bring people in
          </h2>
          <InviteForm tripId={tripId} />
          <InviteList tripId={tripId} />
        </section>
      )}
      {isLeader && (
        <section aria-labelledby="party-home-heading" className={cardClasses}>
          <h2 id="party-home-heading" className="text-lg font-semibold text-scree-900">
            Keep someone at home informed
          </h2>
          <ShareLinkPanel tripId={tripId} />
          <SendHomePanel tripId={tripId} />
        </section>
      )}
    </div>
  );
}
