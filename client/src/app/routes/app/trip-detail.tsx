import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { paths } from '@/config/paths';
import { PartyTab } from '@/features/party/components/party-tab';
import { PackingListTab, PlanTab, TryKitTab } from '@/features/plan';
import { getTripQueryOptions, useTrip } from '@/features/trips/api/get-trip';
import { TripDetailPage, type TripTab } from '@/features/trips/components/trip-detail-page';
import { requireAccount } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireAccount(queryClient, request);
    if (params.tripId) void queryClient.prefetchQuery(getTripQueryOptions(params.tripId));
    return null;
  };

const tripTabs: readonly TripTab[] = [
  { name: 'Plan', Panel: PlanTab },
  { name: 'Try a kit', Panel: TryKitTab },
  { name: 'Packing list', Panel: PackingListTab },
  { name: 'Party', Panel: PartyTab },
];

export default function TripDetailRoute() {
  const tripId = useParams().tripId ?? '';
  const name = useTrip(tripId).data?.name ?? 'Trip';
  return (
    <>
      <PageTitle title={name} />
      <PageHeader title={name} />
      <TripDetailPage tripId={tripId} editHref={paths.app.editTrip.getHref(tripId)} tabs={tripTabs} />
    </>
  );
}
