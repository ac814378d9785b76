import { PageTitle } from '@/components/seo/page-title';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';

export default function NotFoundRoute() {
  return (
    <main id="main" className="flex min-h-dvh items-center justify-center bg-firn-50 px-4">
      <PageTitle title="Not found" />
      <div className="max-w-md">
        <p className="text-sm font-semibold tracking-wide text-moss-700 uppercase">Off the map</p>
        <h1 className="mt-2 text-3xl font-semibold text-scree-950">This page does not exist</h1>
        <p className="mt-3 text-scree-700">The address may be mistyped, or the page was moved.</p>
        <p className="mt-6">
          <TextLink to={paths.home.getHref()}>Back to Gramwatt</TextLink>
        </p>
      </div>
    </main>
  );
}
