import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { getAccountsQueryOptions } from '@/features/admin/api/get-accounts';
import { AccountsTable } from '@/features/admin/components/accounts-table';
import { requireRole } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, 'admin');
    // Start the table's request with the route's code instead of after the first render.
    void queryClient.prefetchQuery(getAccountsQueryOptions());
    return null;
  };

export default function AdminAccountsRoute() {
  return (
    <>
      <PageTitle title="Accounts" />
      <PageHeader title="Accounts">
        Change who is an admin, or stop an account from signing in. There is always at least one admin.{' '}
        <TextLink to={paths.app.adminMail.getHref()}>Mail delivery</TextLink> ·{' '}
        <TextLink to={paths.app.adminCatalogue.getHref()}>Catalogue entries</TextLink>
      </PageHeader>
      <AccountsTable />
    </>
  );
}
