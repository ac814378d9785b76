import { maxSendHomeNoteLength, sendHomeSchema } from '@gramwatt/shared';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { useMembers } from '../api/get-members';
import { useSendPlanHome } from '../api/send-plan-home';

const statusWords = { queued: 'waiting to go out', sent: 'sent', failed: 'could not be sent' } as const;

/** The leader e-mails the viewers the trip summary, the chosen kit, the cautions and the read-only link. */
export function SendHomePanel({ tripId }: { tripId: string }) {
  const members = useMembers(tripId);
  const send = useSendPlanHome();
  const [note, setNote] = useState('');
  const [noteError, setNoteError] = useState<string | undefined>();
  const noteId = useId();
  const viewers = members.data?.filter((member) => member.role === 'viewer') ?? [];

  const submit = () => {
    const parsed = sendHomeSchema.safeParse({ note: note.trim() === '' ? undefined : note });
    if (!parsed.success) return setNoteError(parsed.error.issues[0]?.message);
    setNoteError(undefined);
    send.mutate({ tripId, data: parsed.data });
  };

  return (
    <section aria-labelledby="party-send-home-heading" className="flex flex-col gap-3">
      <h3 id="party-send-home-heading" className="font-semibold text-scree-950">
        Send the plan home
      </h3>
      <p className="text-sm text-scree-700">
        {viewers.length === 0
          ? 'Nobody to send it to yet: invite a contact at home as a viewer first.'
          : `E-mails ${viewers.map((v) => v.displayName).join(', ')} the dates, start point, who carries what, the cautions and the read-only link (made now if there is none).`}
      </p>
      {viewers.length > 0 && (
        <div className="flex flex-col gap-1.5">
          <label htmlFor={noteId} className="text-sm font-medium text-scree-900">
            A note at the top (optional)
          </label>
          <textarea
            id={noteId}
            value={note}
            onChange={(event) => setNote(event.target.value)}
            rows={3}
            maxLength={maxSendHomeNoteLength + 1}
            aria-invalid={noteError ? true : undefined}
            aria-describedby={noteError ? `${noteId}-error` : undefined}
            placeholder="Where we park, when to expect a message from us"
            className="w-full max-w-xl rounded-lg border-2 border-scree-300 bg-white px-3 py-2 text-base text-scree-950 placeholder:text-scree-500 focus:border-tarn-600 focus:outline-none"
          />
          {noteError && (
            <p id={`${noteId}-error`} className="text-sm font-medium text-rosehip-700">
              {noteError}
            </p>
          )}
        </div>
      )}
      <div aria-live="polite">
        {send.isError && (
          <Alert tone="error" title="The plan was not sent">
            {send.error.message}
          </Alert>
        )}
        {send.isSuccess && (
          <Alert tone="done" title="Plan sent home">
            <ul>
              {send.data.sent.map((s) => (
                <li key={s.email}>
                  {s.displayName} ({s.email}): {statusWords[s.status]}
                </li>
              ))}
            </ul>
          </Alert>
        )}
      </div>
      <div>
        <Button onClick={submit} isLoading={send.isPending} disabled={viewers.length === 0}>
          Send the plan home
        </Button>
      </div>
    </section>
  );
}
