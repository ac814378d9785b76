import type { ReactNode } from 'react';
import { PageTitle } from '../seo/page-title';
import { DayStripMotif } from './day-strip-motif';
import { GramwattMark } from './gramwatt-mark';

export interface AuthLayoutProps {
  title: string;
  /** Id of the page heading, so the form can name itself after it. */
  headingId: string;
  children: ReactNode;
  footer?: ReactNode;
}

/** Sign-in and sign-up: the product's one-line promise beside a single, narrow form. */
export function AuthLayout({ title, headingId, children, footer }: AuthLayoutProps) {
  return (
    <div className="min-h-dvh bg-firn-50 lg:grid lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
      <PageTitle title={title} />
      <header className="bg-scree-900 px-6 py-8 text-firn-50 sm:px-10 lg:flex lg:flex-col lg:justify-between lg:py-12">
        <div className="flex items-center gap-3">
          <GramwattMark className="size-9" />
          <span className="text-xl font-semibold tracking-tight">Gramwatt</span>
        </div>
        <div className="mt-6 max-w-md lg:mt-0">
          <p className="text-2xl leading-snug font-semibold text-white sm:text-3xl">
            Enough charge for every day out, and not a gram more.
          </p>
          <p className="mt-3 hidden text-scree-200 sm:block">
            Gramwatt picks the panels, banks and leads from your own gear that keep your radio and phone going through
            the cloudy days — and tells you what each extra margin weighs.
          </p>
          <DayStripMotif className="mt-8 hidden max-w-sm sm:flex" />
        </div>
        <p className="mt-8 hidden text-sm text-scree-300 lg:block">
          Figures are estimates. Carry a margin and follow the maker&rsquo;s advice for every battery.
        </p>
      </header>
      <main id="main" className="flex items-start justify-center px-4 py-10 sm:px-6 lg:items-center lg:py-16">
        <div className="w-full max-w-sm">
          <h1 id={headingId} className="text-2xl font-semibold text-scree-950">
            {title}
          </h1>
          <div className="mt-6">{children}</div>
          {footer && <div className="mt-8 border-t-2 border-firn-200 pt-6 text-scree-700">{footer}</div>}
        </div>
      </main>
    </div>
  );
}
