import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { paths } from '@/config/paths';
import { TripForm } from '@/features/trips/components/trip-form';
import { requireAccount } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireAccount(queryClient, request);
    return null;
  };

export default function TripNewRoute() {
  const navigate = useNavigate();
  return (
    <>
      <PageTitle title="New trip" />
      <PageHeader title="New trip">Where and when: the sun and the sky follow from these.</PageHeader>
      <TripForm
        onSaved={(trip) => navigate(paths.app.trip.getHref(trip.id))}
        onCancel={() => navigate(paths.app.trips.getHref())}
      />
    </>
  );
}
