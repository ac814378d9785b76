import type { ReactNode } from 'react';
import { GramwattMark } from './gramwatt-mark';

/** Pages anyone with a link may open (no account): the wordmark, the page, the estimates note. */
export function PublicLayout({ eyebrow, children }: { eyebrow: string; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col bg-firn-50">
      <header className="bg-scree-900 text-firn-50">
        <div className="mx-auto flex max-w-4xl flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3 sm:px-6">
          <span className="flex items-center gap-2.5">
            <GramwattMark />
            <span className="text-lg font-semibold tracking-tight">Gramwatt</span>
          </span>
          <span className="text-sm text-scree-200">{eyebrow}</span>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-4xl flex-1 px-4 py-8 sm:px-6">
        {children}
      </main>
      <footer className="border-t-2 border-firn-200 px-4 py-5 text-center text-sm text-scree-600 sm:px-6">
        Gramwatt&rsquo;s figures are estimates: carry a margin, and follow the maker&rsquo;s advice for every battery.
      </footer>
    </div>
  );
}
