import type { Account, InviteAccepted } from '@gramwatt/shared';
import type { ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PageSpinner } from '@/components/ui/spinner';
import { isApiError } from '@/lib/api-client';
import { useAcceptInvite } from '../api/accept-invite';
import { useInvitePreview } from '../api/get-invite-preview';
import { roleLabel, roleMeaning } from '../utils/party-format';

export interface InviteAnswerProps {
  token: string;
  /** The signed-in account, or null when nobody is signed in. */
  account: Account | null;
  /**
   * Sign-in and sign-up for someone signed out; `onSignedIn` accepts the invite straight after. The route
   * supplies the forms, as features do not import each other.
   */
  renderSignIn: (onSignedIn: () => void) => ReactNode;
  /** Signs out, so someone signed in with another address can switch. */
  onSignOut: () => void;
  onAccepted: (accepted: InviteAccepted) => void;
}

/** Why a link cannot be used, in words for the person holding it. */
function explainRefusal(error: Error): { title: string; text: string } {
  if (isApiError(error, 404))
    return {
      title: 'This invite link is not recognised',
      text: 'Check that the whole link was copied from the e-mail, or ask the trip leader to invite you again.',
    };
  if (isApiError(error, 410)) return { title: 'This invite no longer works', text: error.message };
  return { title: 'The invite could not be opened', text: error.message };
}

/**
 * What an invite link opens: the trip, the role and who invited; then joining — straight away when
 * signed in, after signing in or making an account otherwise. Used, withdrawn and expired links say so.
 */
export function InviteAnswer({ token, account, renderSignIn, onSignOut, onAccepted }: InviteAnswerProps) {
  const preview = useInvitePreview(token);
  const accept = useAcceptInvite();
  const join = () => accept.mutate({ token }, { onSuccess: onAccepted });

  if (preview.isPending) return <PageSpinner label="Opening the invite" />;
  if (preview.isError) {
    const { title, text } = explainRefusal(preview.error);
    return (
      <Alert tone="error" title={title}>
        {text}
      </Alert>
    );
  }

  const { tripName, role, inviterName } = preview.data;
  const refusal = accept.isError ? accept.error : null;
  return (
    <div className="flex flex-col gap-6">
      <div className="rounded-xl border-2 border-scree-200 bg-white p-4">
        <p className="text-scree-800">
          {inviterName} asks you to join <strong className="font-semibold text-scree-950">{tripName}</strong> as a{' '}
          <strong className="font-semibold text-scree-950">{roleLabel[role].toLowerCase()}</strong>.
        </p>
        <p className="mt-2 text-sm text-scree-700">
          What a {role} does: {roleMeaning[role].charAt(0).toLowerCase()}
          {roleMeaning[role].slice(1)}
        </p>
      </div>

      {refusal && (
        <Alert tone="error" title={isApiError(refusal, 409) ? 'Already on this trip' : 'Could not join'}>
          {refusal.message}
          {isApiError(refusal, 403) && (
            <p className="mt-2">
              <Button
                variant="secondary"
                size="sm"
                onClick={() => {
                  accept.reset();
                  onSignOut();
                }}
              >
                Sign out and use that address
              </Button>
            </p>
          )}
        </Alert>
      )}

      {account ? (
        <div className="flex flex-col gap-3">
          <p className="text-sm text-scree-700">
            Signed in as {account.displayName} ({account.email}). The invite works only for the address it was sent to.
          </p>
          <div>
            <Button onClick={join} isLoading={accept.isPending}>
              Join {tripName}
            </Button>
          </div>
        </div>
      ) : (
        <div className="flex flex-col gap-3">
          <p className="text-scree-800">
            Sign in, or make an account, with the e-mail address the invite came to. You join the trip as soon as you
            are in.
          </p>
          {renderSignIn(join)}
        </div>
      )}
    </div>
  );
}
