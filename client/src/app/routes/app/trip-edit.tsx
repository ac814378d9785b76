import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { Alert } from '@/components/ui/alert';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getTripQueryOptions, useTrip } from '@/features/trips/api/get-trip';
import { TripForm } from '@/features/trips/components/trip-form';
import { requireAccount } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireAccount(queryClient, request);
    if (params.tripId) void queryClient.prefetchQuery(getTripQueryOptions(params.tripId));
    return null;
  };

export default function TripEditRoute() {
  const tripId = useParams().tripId ?? '';
  const navigate = useNavigate();
  const trip = useTrip(tripId);
  const back = () => navigate(paths.app.trip.getHref(tripId));
  return (
    <>
      <PageTitle title="Edit trip" />
      <PageHeader title={trip.data ? `Edit ${trip.data.name}` : 'Edit trip'} />
      {trip.isPending && <Spinner label="Loading the trip" />}
      {trip.isError && (
        <Alert tone="error" title="This trip could not be loaded">
          {trip.error.message}
        </Alert>
      )}
      {trip.data && <TripForm trip={trip.data} onSaved={back} onCancel={back} />}
    </>
  );
}
