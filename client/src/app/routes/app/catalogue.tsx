import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { paths } from '@/config/paths';
import { getCatalogueQueryOptions } from '@/features/catalogue/api/get-catalogue';
import { CatalogueBrowser } from '@/features/catalogue/components/catalogue-browser';
import { getLockerItemsQueryOptions } from '@/features/locker/api/get-locker-items';
import { gearPresenter } from '@/features/locker/utils/gear-presenter';
import { requireAccount, useAccount } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireAccount(queryClient, request);
    void queryClient.prefetchQuery(getCatalogueQueryOptions());
    return null;
  };

export default function CatalogueRoute() {
  const queryClient = useQueryClient();
  const isAdmin = useAccount().data?.role === 'admin';
  return (
    <>
      <PageTitle title="Catalogue" />
      <PageHeader title="Catalogue">
        Generic example gear to start your locker from. Copy an entry, then adjust its figures to match what you own.
      </PageHeader>
      <CatalogueBrowser
        gear={gearPresenter}
        lockerHref={paths.app.locker.getHref()}
        manageHref={isAdmin ? paths.app.adminCatalogue.getHref() : undefined}
        onCopied={() => void queryClient.invalidateQueries({ queryKey: getLockerItemsQueryOptions().queryKey })}
      />
    </>
  );
}
