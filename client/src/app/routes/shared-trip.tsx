import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PublicLayout } from '@/components/layouts/public-layout';
import { PageTitle } from '@/components/seo/page-title';
import { getSharedTripQueryOptions, useSharedTrip } from '@/features/party/api/get-shared-trip';
import { SharedTripView } from '@/features/party/components/shared-trip-view';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    if (params.token) void queryClient.prefetchQuery(getSharedTripQueryOptions(params.token));
    return null;
  };

/** `/share/:token`: the trip read-only for someone at home, no account needed. */
export default function SharedTripRoute() {
  const token = useParams().token ?? '';
  const name = useSharedTrip(token).data?.name;
  return (
    <PublicLayout eyebrow="A trip shared with you">
      <PageTitle title={name ?? 'Shared trip'} />
      <SharedTripView token={token} />
    </PublicLayout>
  );
}
