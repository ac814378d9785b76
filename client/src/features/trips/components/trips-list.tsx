import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { buttonClasses } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Spinner } from '@/components/ui/spinner';
import { useTrips } from '../api/get-trips';
import { formatDate, formatPlace, phaseLabel } from '../utils/trip-format';

export interface TripsListProps {
  newTripHref: string;
  tripHref: (tripId: string) => string;
}

/** The member's trips as the API orders them: upcoming and under way first, then past ones. */
export function TripsList({ newTripHref, tripHref }: TripsListProps) {
  const trips = useTrips();
  if (trips.isPending) return <Spinner label="Loading your trips" />;
  if (trips.isError)
    return (
      <Alert tone="error" title="Your trips could not be loaded">
        {trips.error.message}
      </Alert>
    );
  const list = trips.data.trips;
  const newLink = (
    <Link to={newTripHref} className={buttonClasses('primary')}>
      Plan a trip
    </Link>
  );
  if (list.length === 0)
    return (
      <EmptyState title="No trips yet" action={newLink}>
        <p>Give the place, the dates and your devices, and Gramwatt works out the lightest kit from your own gear.</p>
      </EmptyState>
    );
  return (
    <div className="flex flex-col gap-4">
      <div>{newLink}</div>
      <ul className="flex flex-col gap-3">
        {list.map((trip) => (
          <li key={trip.id} className="rounded-xl border-2 border-scree-200 bg-white p-4">
            <p className="text-sm font-medium text-scree-600">{phaseLabel[trip.phase]}</p>
            <h2 className="text-lg font-semibold text-scree-950">
              <Link to={tripHref(trip.id)} className="underline decoration-2 underline-offset-4 hover:text-tarn-700">
                {trip.name}
              </Link>
            </h2>
            <p className="text-scree-800">
              {formatDate(trip.startDate)} to {formatDate(trip.endDate)} · {trip.nights}{' '}
              {trip.nights === 1 ? 'night' : 'nights'}
            </p>
            <p className="text-sm text-scree-700">
              {formatPlace(trip.latitudeDeg, trip.longitudeDeg)} · {trip.deviceCount}{' '}
              {trip.deviceCount === 1 ? 'device' : 'devices'} · {trip.memberCount}{' '}
              {trip.memberCount === 1 ? 'person' : 'people'} · you are {trip.myRole}
            </p>
          </li>
        ))}
      </ul>
    </div>
  );
}
