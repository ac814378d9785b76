import type { DeviceKind, SharedTrip } from '@gramwatt/shared';
import type { ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { PageSpinner } from '@/components/ui/spinner';
import { isApiError } from '@/lib/api-client';
import { formatDate, formatPlace } from '@/lib/format';
import { useSharedTrip } from '../api/get-shared-trip';
import { formatDateTime, formatGramLimit, roleLabel } from '../utils/party-format';

const deviceKindWords: Record<DeviceKind, string> = {
  radio: 'radio',
  phone: 'phone',
  messenger: 'satellite messenger',
  headlamp: 'headlamp',
  camera: 'camera',
  other: 'device',
};

/** Shown until the leader chooses a kit: the product's standing cautions in short (PRODUCT.md, "Cautions"). */
const standingCautions = [
  'Figures are estimates, not a guarantee: the party carries a margin.',
  'Lithium batteries can burn: protected packs, the right charger, no charging below freezing, not left cooking in the sun.',
  'Transmitting on a radio needs the licence the law of the place requires.',
];

function Block({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="rounded-xl border-2 border-scree-200 bg-white p-4 sm:p-5">
      <h2 id={id} className="text-lg font-semibold text-scree-900">
        {title}
      </h2>
      <div className="mt-3">{children}</div>
    </section>
  );
}

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div>
      <dt className="text-sm font-medium text-scree-600">{term}</dt>
      <dd className="text-scree-900">{children}</dd>
    </div>
  );
}

/** Why the chosen kit's verdict may be stale, as the summary flags it. */
const staleNotes = [
  {
    when: 'tripChanged',
    title: 'The trip or its gear changed after this kit was chosen',
    text: 'Its verdict is for the devices, use and gear the trip had then.',
  },
  {
    when: 'earlierPlanner',
    title: 'An earlier version of the planner judged this kit',
    text: 'Gramwatt now weighs the same trip and gear a little differently, so this verdict may no longer be its answer.',
  },
] as const;

function PlanBlock({ plan }: { plan: SharedTrip['plan'] }) {
  if (!plan)
    return (
      <Block id="shared-plan-heading" title="The kit">
        <p className="text-scree-800">The leader has not chosen a kit yet. Open this link again nearer the start.</p>
      </Block>
    );
  return (
    <Block id="shared-plan-heading" title="The kit">
      {staleNotes
        .filter((note) => plan[note.when])
        .map((note) => (
          <div key={note.when} className="mb-3">
            <Alert tone="caution" title={note.title}>
              {note.text} Ask the trip leader to choose the kit again.
            </Alert>
          </div>
        ))}
      <p className="text-lg font-medium text-scree-950">{plan.verdict}</p>
      <p className="mt-1 text-scree-700">{plan.kitMassG.toLocaleString('en-GB')} g of power gear in all.</p>
      <ul className="mt-4 grid gap-3 sm:grid-cols-2">
        {plan.carriers.map((carrier) => (
          <li key={carrier.name} className="rounded-lg border-2 border-firn-200 bg-firn-50 p-3">
            <p className="flex flex-wrap justify-between gap-x-3 font-semibold text-scree-950">
              <span>{carrier.name} carries</span>
              <span className="font-normal text-scree-700">{carrier.massG.toLocaleString('en-GB')} g</span>
            </p>
            {carrier.items.length === 0 ? (
              <p className="mt-1 text-sm text-scree-700">No power gear.</p>
            ) : (
              <ul className="mt-1 list-disc pl-5 text-sm text-scree-800">
                {carrier.items.map((item) => (
                  <li key={item.name}>
                    {item.count > 1 ? `${item.count} × ` : ''}
                    {item.name}
                  </li>
                ))}
              </ul>
            )}
          </li>
        ))}
      </ul>
    </Block>
  );
}

/** The read-only page a share link opens: dates, start point, party, devices, the chosen kit and the cautions. */
export function SharedTripView({ token }: { token: string }) {
  const query = useSharedTrip(token);
  if (query.isPending) return <PageSpinner label="Opening the trip" />;
  if (query.isError) {
    const gone = isApiError(query.error, 410);
    return (
      <div className="max-w-xl">
        <h1 className="text-2xl font-semibold text-scree-950">
          {gone
            ? 'This link no longer works'
            : isApiError(query.error, 404)
              ? 'This link is not recognised'
              : 'The trip could not be opened'}
        </h1>
        <p className="mt-3 text-scree-700">
          {gone
            ? `${query.error.message}.`.replace(/\.\.$/, '.')
            : isApiError(query.error, 404)
              ? 'Check that the whole link was copied, or ask the trip leader to send it again.'
              : query.error.message}
        </p>
      </div>
    );
  }

  const trip = query.data;
  // A chosen kit carries the cautions that apply to it (always ending with the estimates one); before that, the standing ones.
  const cautions = trip.plan ? trip.plan.cautions : standingCautions;
  return (
    <article aria-labelledby="shared-trip-heading" className="flex flex-col gap-5">
      <header>
        <p className="text-sm font-medium text-scree-600">Trip plan, read-only</p>
        <h1 id="shared-trip-heading" className="mt-1 text-2xl font-semibold break-words text-scree-950 sm:text-3xl">
          {trip.name}
        </h1>
        <p className="mt-1 text-sm text-scree-600">This link works until {formatDateTime(trip.linkExpiresAt)}.</p>
      </header>

      <Block id="shared-when-heading" title="When and where">
        <dl className="grid gap-4 sm:grid-cols-3">
          <Fact term="Dates">
            {formatDate(trip.startDate)} to {formatDate(trip.endDate)} ({trip.nights}{' '}
            {trip.nights === 1 ? 'night' : 'nights'})
          </Fact>
          <Fact term="Start point">
            {formatPlace(trip.latitudeDeg, trip.longitudeDeg)}
            <span className="block text-sm text-scree-600">Times are {trip.timeZone}</span>
          </Fact>
          <Fact term="Power gear limit">
            {trip.gramLimitG === null ? 'None set' : formatGramLimit(trip.gramLimitG)}
          </Fact>
        </dl>
      </Block>

      <div className="grid gap-5 md:grid-cols-2">
        <Block id="shared-party-heading" title="The party">
          <ul className="flex flex-col gap-1">
            {trip.members.map((member, index) => (
              <li key={`${member.displayName}-${index}`} className="flex justify-between gap-3">
                <span className="font-medium text-scree-950">{member.displayName}</span>
                <span className="text-scree-700">{roleLabel[member.role]}</span>
              </li>
            ))}
          </ul>
        </Block>
        <Block id="shared-devices-heading" title="Devices">
          {trip.devices.length === 0 ? (
            <p className="text-scree-700">No devices listed yet.</p>
          ) : (
            <ul className="flex flex-col gap-1">
              {trip.devices.map((device, index) => (
                <li key={`${device.name}-${index}`}>
                  <span className="font-medium text-scree-950">{device.name}</span>{' '}
                  <span className="text-scree-700">
                    ({deviceKindWords[device.deviceKind]}), carried by {device.carrierName}
                  </span>
                </li>
              ))}
            </ul>
          )}
        </Block>
      </div>

      <PlanBlock plan={trip.plan} />

      <Block id="shared-cautions-heading" title="Cautions">
        <ul className="list-disc pl-5 text-scree-800">
          {cautions.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
      </Block>
    </article>
  );
}
