import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { paths } from '@/config/paths';
import { getOutboxQueryOptions } from '@/features/outbox/api/get-outbox';
import { OutboxScreen } from '@/features/outbox/components/outbox-screen';
import { requireAccount } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireAccount(queryClient, request);
    void queryClient.prefetchQuery(getOutboxQueryOptions());
    return null;
  };

export default function OutboxRoute() {
  const [searchParams] = useSearchParams();
  return (
    <>
      <PageTitle title="Outbox" />
      <PageHeader title="Outbox">
        Mail on this server stays here instead of going out: these are the messages sent to your address.
      </PageHeader>
      <OutboxScreen selectedId={searchParams.get('message')} hrefFor={paths.app.outbox.getHref} />
    </>
  );
}
