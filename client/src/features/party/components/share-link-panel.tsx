import type { ShareLink } from '@gramwatt/shared';
import { useId, useRef, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Select } from '@/components/ui/select';
import { Spinner } from '@/components/ui/spinner';
import { TextLink } from '@/components/ui/text-link';
import { useCreateShareLink } from '../api/create-share-link';
import { useShareLink } from '../api/get-share-link';
import { useRevokeShareLink } from '../api/revoke-share-link';
import { describeShareLink } from '../utils/party-format';

/** Lifetimes a leader picks from, in days (up to the server's longest, a year); 30 matches its default. */
const lifetimeOptions = [
  { value: '7', label: '7 days' },
  { value: '14', label: '14 days' },
  { value: '30', label: '30 days' },
  { value: '60', label: '60 days' },
  { value: '90', label: '90 days' },
  { value: '180', label: '180 days' },
  { value: '365', label: 'a year' },
] as const;
type LifetimeDays = (typeof lifetimeOptions)[number]['value'];

/** Copies text, falling back to selecting it in the field so the reader can copy it by hand. */
async function copyText(text: string, field: HTMLInputElement | null): Promise<boolean> {
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    field?.select();
    return false;
  }
}

function ActiveLink({ share, onRevoke }: { share: ShareLink & { url: string }; onRevoke: () => void }) {
  const fieldId = useId();
  const field = useRef<HTMLInputElement>(null);
  const [copyNote, setCopyNote] = useState<string | null>(null);
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor={fieldId} className="text-sm font-medium text-scree-900">
        Read-only link
      </label>
      <div className="flex flex-col gap-2 sm:flex-row">
        <input
          id={fieldId}
          ref={field}
          readOnly
          value={share.url}
          onFocus={(event) => event.target.select()}
          className="min-h-11 w-full min-w-0 rounded-lg border-2 border-scree-300 bg-firn-100 px-3 font-mono text-sm text-scree-900"
        />
        <Button
          variant="secondary"
          className="shrink-0"
          onClick={async () =>
            setCopyNote((await copyText(share.url, field.current)) ? 'Copied.' : 'Selected: copy it with your keys.')
          }
        >
          Copy link
        </Button>
      </div>
      <p className="text-sm text-scree-700">
        {describeShareLink(share)}{' '}
        <span role="status" className="font-medium text-moss-800">
          {copyNote}
        </span>
      </p>
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
        {share.path && <TextLink to={share.path}>See what it shows</TextLink>}
        <Button variant="quiet" size="sm" className="text-rosehip-700" onClick={onRevoke}>
          Revoke the link
        </Button>
      </div>
    </div>
  );
}

/**
 * The leader's read-only link for people without an account: make one with a lifetime, copy it, revoke it.
 * Making a new link stops the old one.
 */
export function ShareLinkPanel({ tripId }: { tripId: string }) {
  const share = useShareLink(tripId);
  const create = useCreateShareLink();
  const revoke = useRevokeShareLink();
  const [days, setDays] = useState<LifetimeDays>('30');
  const [confirmRevoke, setConfirmRevoke] = useState(false);
  const daysId = useId();

  const error = create.error ?? revoke.error;
  return (
    <section aria-labelledby="party-share-heading" className="flex flex-col gap-3">
      <h3 id="party-share-heading" className="font-semibold text-scree-950">
        Link for people at home
      </h3>
      <p className="text-sm text-scree-700">
        Anyone with the link can read the dates, start point, party, devices and the chosen kit — no account, no e-mail
        addresses, nothing they can change.
      </p>
      {error && (
        <Alert tone="error" title="The link was not changed">
          {error.message}
        </Alert>
      )}
      {share.isPending && <Spinner label="Loading the link" />}
      {share.isError && (
        <Alert tone="error" title="The link could not be loaded">
          {share.error.message}
        </Alert>
      )}
      {share.isSuccess && share.data.state === 'active' && share.data.url ? (
        <ActiveLink share={{ ...share.data, url: share.data.url }} onRevoke={() => setConfirmRevoke(true)} />
      ) : (
        share.isSuccess && <p className="text-scree-800">{describeShareLink(share.data)}</p>
      )}
      {share.isSuccess && (
        <div className="flex flex-wrap items-end gap-2">
          <label htmlFor={daysId} className="flex flex-col gap-1.5 text-sm font-medium text-scree-900">
            Works for
            <Select
              id={daysId}
              options={lifetimeOptions}
              value={days}
              onValueChange={setDays}
              className="min-h-11 font-normal"
            />
          </label>
          <Button
            variant={share.data.state === 'active' ? 'secondary' : 'primary'}
            isLoading={create.isPending}
            onClick={() => create.mutate({ tripId, data: { expiresInDays: Number(days) } })}
          >
            {share.data.state === 'active' ? 'Make a new link' : 'Make a link'}
          </Button>
        </div>
      )}
      {share.isSuccess && share.data.state === 'active' && (
        <p className="text-sm text-scree-600">
          A new link stops the one above. Pick a time that lasts until you are home.
        </p>
      )}
      <Dialog
        open={confirmRevoke}
        onClose={() => !revoke.isPending && setConfirmRevoke(false)}
        title="Revoke the read-only link?"
        description="Whoever has it — including anyone you sent the plan to — gets a notice that it no longer works. You can make a new link at any time."
        actions={
          <>
            <Button
              variant="secondary"
              data-autofocus
              onClick={() => setConfirmRevoke(false)}
              disabled={revoke.isPending}
            >
              Keep it
            </Button>
            <Button
              variant="danger"
              isLoading={revoke.isPending}
              onClick={() => revoke.mutate({ tripId }, { onSettled: () => setConfirmRevoke(false) })}
            >
              Revoke
            </Button>
          </>
        }
      />
    </section>
  );
}
