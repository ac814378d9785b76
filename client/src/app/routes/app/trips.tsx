import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { EmptyState } from '@/components/ui/empty-state';

function TripsIllustration() {
  return (
    <svg
      viewBox="0 0 64 48"
      className="h-16 w-20"
      fill="none"
      stroke="currentColor"
      strokeWidth="2.5"
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      <path d="M4 40 20 18l9 11 8-9 23 20Z" />
      <circle cx="46" cy="12" r="5" />
      <path d="M10 44h44" strokeDasharray="3 5" />
    </svg>
  );
}

export default function TripsRoute() {
  return (
    <>
      <PageTitle title="Trips" />
      <PageHeader title="Trips">
        Where you are going, for how long, under what sky — and the kit that carries you through.
      </PageHeader>
      <EmptyState title="No trips planned yet" illustration={<TripsIllustration />}>
        <p>
          Planning a trip comes after the locker: you will give the place, the dates and your devices, and Gramwatt will
          work out the lightest kit from your own gear, day by day. That part is still being built, so this list stays
          empty for now.
        </p>
      </EmptyState>
    </>
  );
}
