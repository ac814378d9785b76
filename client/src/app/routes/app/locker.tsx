import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { paths } from '@/config/paths';
import { getLockerItemsQueryOptions } from '@/features/locker/api/get-locker-items';
import { LockerScreen } from '@/features/locker/components/locker-screen';
import { requireAccount } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireAccount(queryClient, request);
    // Start the locker's request with the route's code instead of after the first render.
    void queryClient.prefetchQuery(getLockerItemsQueryOptions());
    return null;
  };

export default function LockerRoute() {
  return (
    <>
      <PageTitle title="Locker" />
      <PageHeader title="Locker">
        The gear you own, grouped by what it does: collect, store, convert, connect and use.
      </PageHeader>
      <LockerScreen catalogueHref={paths.app.catalogue.getHref()} />
    </>
  );
}
