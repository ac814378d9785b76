import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useOutboxIsLocal } from '@/features/outbox/api/get-outbox-status';
import { requireAccount, useAccount } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) =>
    requireAccount(queryClient, request);

/** Everything behind sign-in. A session that ends mid-visit (a 401 anywhere) clears the account and lands here. */
export default function AppRoot() {
  const account = useAccount();
  const location = useLocation();
  const showOutbox = useOutboxIsLocal();
  if (account.isPending) return <PageSpinner />;
  if (!account.data)
    return <Navigate to={paths.auth.signIn.getHref(`${location.pathname}${location.search}`)} replace />;
  return (
    <AppLayout account={account.data} showOutbox={showOutbox}>
      <Outlet />
    </AppLayout>
  );
}
