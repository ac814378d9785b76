import { Tab, TabGroup, TabList, TabPanel, TabPanels } from '@headlessui/react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { buttonClasses } from '@/components/ui/button';
import { cn } from '@/components/ui/cn';
import { Spinner } from '@/components/ui/spinner';
import type { ComponentType } from 'react';
import { useTrip } from '../api/get-trip';
import { describeSky, formatDate, formatPlace, phaseLabel } from '../utils/trip-format';
import { TripDevices } from './trip-devices';

export interface TripDetailPageProps {
  tripId: string;
  editHref: string;
  tabs: readonly TripTab[];
}

function Fact({ term, children }: { term: string; children: React.ReactNode }) {
  return (
    <div>
      <dt className="text-sm font-medium text-scree-600">{term}</dt>
      <dd className="text-scree-900">{children}</dd>
    </div>
  );
}

/** Props of each tab's panel (the plan feature's `PlanTab`, `TryKitTab`, `PackingListTab`). */
export interface TripTabProps {
  tripId: string;
  canSolve: boolean;
  canChooseKit: boolean;
}

/** A tab of the trip page; the route passes them in, as features do not import each other. */
export interface TripTab {
  name: string;
  Panel: ComponentType<TripTabProps>;
}

/** A trip: the overview, its devices, and the Plan / Try a kit / Packing list tabs. */
export function TripDetailPage({ tripId, editHref, tabs }: TripDetailPageProps) {
  const query = useTrip(tripId);
  if (query.isPending) return <Spinner label="Loading the trip" />;
  if (query.isError)
    return (
      <Alert tone="error" title="This trip could not be loaded">
        {query.error.message}
      </Alert>
    );
  const trip = query.data;
  const isLeader = trip.myRole === 'leader';
  const canSolve = trip.myRole !== 'viewer';

  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="trip-overview-heading" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 id="trip-overview-heading" className="text-lg font-semibold text-scree-900">
            {phaseLabel[trip.phase]} · you are {trip.myRole}
          </h2>
          {isLeader && (
            <Link to={editHref} className={buttonClasses('secondary')}>
              Edit trip
            </Link>
          )}
        </div>
        <dl className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          <Fact term="Dates">
            {formatDate(trip.startDate)} to {formatDate(trip.endDate)} ({trip.nights}{' '}
            {trip.nights === 1 ? 'night' : 'nights'}, {trip.nights + 1} days)
          </Fact>
          <Fact term="Start point">
            {formatPlace(trip.latitudeDeg, trip.longitudeDeg)} · {trip.timeZone}
          </Fact>
          <Fact term="Walking and camp">
            Walking {trip.walkWindow.start}–{trip.walkWindow.end}, camp {trip.campWindow.start}–{trip.campWindow.end};
            re-aim every {trip.reaimEveryH} h
          </Fact>
          <Fact term="Sky">{describeSky(trip)}</Fact>
          <Fact term="Reserve">{Math.round(trip.reserveShare * 100)} % of stored energy kept back</Fact>
          <Fact term="Gram limit">{trip.gramLimitG === null ? 'No limit' : `${trip.gramLimitG} g of power gear`}</Fact>
        </dl>
        {trip.notes && <p className="whitespace-pre-line text-scree-800">{trip.notes}</p>}
      </section>

      <TripDevices tripId={trip.id} devices={trip.devices} canEdit={canSolve} />

      <TabGroup>
        <TabList className="flex flex-wrap gap-2 border-b-2 border-scree-200">
          {tabs.map(({ name }) => (
            <Tab
              key={name}
              className={({ selected }) =>
                cn(
                  '-mb-0.5 min-h-11 border-b-4 px-4 font-medium focus:outline-none focus-visible:ring-2 focus-visible:ring-tarn-600',
                  selected
                    ? 'border-tarn-600 text-scree-950'
                    : 'border-transparent text-scree-600 hover:text-scree-900',
                )
              }
            >
              {name}
            </Tab>
          ))}
        </TabList>
        <TabPanels className="pt-4">
          {tabs.map(({ name, Panel }) => (
            <TabPanel key={name}>
              <Panel tripId={trip.id} canSolve={canSolve} canChooseKit={isLeader} />
            </TabPanel>
          ))}
        </TabPanels>
      </TabGroup>
    </div>
  );
}
