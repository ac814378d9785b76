import { Tab, TabGroup, TabList, TabPanel, TabPanels } from '@headlessui/react';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { cn } from '@/components/ui/cn';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { SignUpForm } from '@/features/auth/components/sign-up-form';
import { getInvitePreviewQueryOptions } from '@/features/party/api/get-invite-preview';
import { InviteAnswer } from '@/features/party/components/invite-answer';
import { getAccountQueryOptions, useAccount, useSignOut } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    // Both answers are needed for the first paint; start them together.
    void queryClient.prefetchQuery(getAccountQueryOptions());
    if (params.token) void queryClient.prefetchQuery(getInvitePreviewQueryOptions(params.token));
    return null;
  };

const tabClasses = ({ selected }: { selected: boolean }) =>
  cn(
    '-mb-0.5 min-h-11 flex-1 border-b-4 px-3 font-medium focus:outline-none focus-visible:ring-2 focus-visible:ring-tarn-600',
    selected ? 'border-moss-600 text-scree-950' : 'border-transparent text-scree-600 hover:text-scree-900',
  );

/** Sign in or make an account without leaving the invite; either way the invite is accepted straight after. */
function SignInOrUp({ onSignedIn }: { onSignedIn: () => void }) {
  return (
    <TabGroup>
      <TabList className="flex border-b-2 border-scree-200" aria-label="How to sign in">
        <Tab className={tabClasses}>I have an account</Tab>
        <Tab className={tabClasses}>I am new here</Tab>
      </TabList>
      <TabPanels className="pt-5">
        <TabPanel>
          <h2 id="sign-in-heading" className="sr-only">
            Sign in to accept
          </h2>
          <SignInForm onSuccess={onSignedIn} />
        </TabPanel>
        <TabPanel>
          <h2 id="sign-up-heading" className="sr-only">
            Make an account to accept
          </h2>
          <SignUpForm onSuccess={onSignedIn} />
        </TabPanel>
      </TabPanels>
    </TabGroup>
  );
}

/** `/invites/:token`: the invite link from the e-mail. Open to everyone; joining needs the invited address. */
export default function InviteRoute() {
  const token = useParams().token ?? '';
  const account = useAccount();
  const navigate = useNavigate();
  const signOut = useSignOut();
  return (
    <AuthLayout title="Trip invite" headingId="invite-heading">
      {account.isPending ? (
        <PageSpinner />
      ) : (
        <InviteAnswer
          token={token}
          account={account.data ?? null}
          renderSignIn={(onSignedIn) => <SignInOrUp onSignedIn={onSignedIn} />}
          onSignOut={() => signOut.mutate()}
          onAccepted={({ tripId }) => navigate(paths.app.trip.getHref(tripId), { replace: true })}
        />
      )}
    </AuthLayout>
  );
}
