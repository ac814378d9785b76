import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { EmptyState } from '@/components/ui/empty-state';

function LockerIllustration() {
  return (
    <svg
      viewBox="0 0 64 48"
      className="h-16 w-20"
      fill="none"
      stroke="currentColor"
      strokeWidth="2.5"
      strokeLinejoin="round"
    >
      <rect x="6" y="10" width="52" height="32" rx="5" />
      <path d="M22 10V6h20v4" />
      <path d="M6 22h52" strokeDasharray="4 4" />
    </svg>
  );
}

export default function LockerRoute() {
  return (
    <>
      <PageTitle title="Locker" />
      <PageHeader title="Locker">
        The gear you own, grouped by what it does: collect, store, convert, connect and use.
      </PageHeader>
      <EmptyState title="Nothing in your locker yet" illustration={<LockerIllustration />}>
        <p>
          Your panels, banks, converters, batteries, leads and devices will live here, each with its grams and ports.
          Adding gear is the next part we are building — for now this shelf stays bare.
        </p>
      </EmptyState>
    </>
  );
}
