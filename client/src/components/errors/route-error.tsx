import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { paths } from '@/config/paths';
import { buttonClasses } from '../ui/button';
import { PageTitle } from '../seo/page-title';

interface Explained {
  title: string;
  message: string;
}

const explain = (error: unknown): Explained => {
  if (isRouteErrorResponse(error)) {
    if (error.status === 404)
      return { title: 'Not found', message: 'There is nothing at this address, or it is not yours to see.' };
    if (error.status === 403)
      return { title: 'Not for your account', message: 'This page needs a role your account does not have.' };
    const data: unknown = error.data;
    const detail =
      data && typeof data === 'object' && 'message' in data && typeof data.message === 'string'
        ? data.message
        : error.statusText;
    return { title: 'Something went wrong', message: detail || `The page answered ${error.status}.` };
  }
  return {
    title: 'Something went wrong',
    message: 'This page hit an error we did not expect. Reload to try again; your saved data is safe on the server.',
  };
};

/** The route error boundary (`errorElement`): says what happened in plain words and offers a way on. */
export function RouteError() {
  const error = useRouteError();
  const { title, message } = explain(error);
  return (
    <section aria-labelledby="route-error-heading" className="mx-auto max-w-xl py-12">
      <PageTitle title={title} />
      <h1 id="route-error-heading" className="text-2xl font-semibold text-scree-950">
        {title}
      </h1>
      <p className="mt-3 text-scree-700">{message}</p>
      {import.meta.env.DEV && error instanceof Error && (
        <pre className="mt-4 overflow-x-auto rounded-lg bg-scree-900 p-4 text-xs text-firn-50">{error.stack}</pre>
      )}
      <div className="mt-6 flex flex-wrap gap-3">
        <a href={paths.home.getHref()} className={buttonClasses('primary')}>
          Go to the start
        </a>
        <button type="button" onClick={() => window.location.reload()} className={buttonClasses('secondary')}>
          Reload
        </button>
      </div>
    </section>
  );
}

/** The same boundary outside the app layout, with a plain page around it. */
export function RootRouteError() {
  return (
    <main id="main" className="min-h-dvh bg-firn-50 px-4">
      <RouteError />
    </main>
  );
}
