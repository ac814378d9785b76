import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { getMailDeliveriesQueryOptions } from '@/features/admin/api/get-mail-deliveries';
import { MailDeliveryTable } from '@/features/admin/components/mail-delivery-table';
import { requireRole } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, 'admin');
    void queryClient.prefetchQuery(getMailDeliveriesQueryOptions());
    return null;
  };

export default function AdminMailRoute() {
  return (
    <>
      <PageTitle title="Mail delivery" />
      <PageHeader title="Mail delivery">
        Whether each invite and plan sent home went out, and why not when it did not. What the messages say stays with
        the people they were sent to. <TextLink to={paths.app.adminAccounts.getHref()}>Accounts</TextLink> ·{' '}
        <TextLink to={paths.app.adminCatalogue.getHref()}>Catalogue entries</TextLink>
      </PageHeader>
      <MailDeliveryTable />
    </>
  );
}
