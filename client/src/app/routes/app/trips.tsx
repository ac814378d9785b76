import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { paths } from '@/config/paths';
import { getTripsQueryOptions } from '@/features/trips/api/get-trips';
import { TripsList } from '@/features/trips/components/trips-list';
import { requireAccount } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireAccount(queryClient, request);
    void queryClient.prefetchQuery(getTripsQueryOptions());
    return null;
  };

export default function TripsRoute() {
  return (
    <>
      <PageTitle title="Trips" />
      <PageHeader title="Trips">
        Where you are going, for how long, under what sky — and the kit that carries you through.
      </PageHeader>
      <TripsList newTripHref={paths.app.newTrip.getHref()} tripHref={paths.app.trip.getHref} />
    </>
  );
}
