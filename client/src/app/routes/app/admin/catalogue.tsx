import { catalogueEntryInputSchema } from '@gramwatt/shared';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '@/components/layouts/app-layout';
import { PageTitle } from '@/components/seo/page-title';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { getCatalogueQueryOptions } from '@/features/catalogue/api/get-catalogue';
import { CatalogueAdmin, type CatalogueEditorProps } from '@/features/catalogue/components/catalogue-admin';
import { SpecEditorPanel } from '@/features/locker/components/spec-editor-panel';
import { gearPresenter } from '@/features/locker/utils/gear-presenter';
import { requireRole } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, 'admin');
    void queryClient.prefetchQuery(getCatalogueQueryOptions());
    return null;
  };

/** The catalogue editor: the locker's per-kind form, checked with the catalogue's own schema. */
function CatalogueEntryEditor({ open, entry, onClose, onSubmit }: CatalogueEditorProps) {
  return (
    <SpecEditorPanel
      open={open}
      title={entry ? `Edit ${entry.name}` : 'Add a catalogue entry'}
      initial={entry ?? undefined}
      bodySchema={catalogueEntryInputSchema}
      submitLabel={entry ? 'Save changes' : 'Add to the catalogue'}
      onSubmit={onSubmit}
      onClose={onClose}
    />
  );
}

export default function AdminCatalogueRoute() {
  return (
    <>
      <PageTitle title="Catalogue entries" />
      <PageHeader title="Catalogue entries">
        Generic example gear members can copy into their lockers. Invented names only, no brands.{' '}
        <TextLink to={paths.app.adminAccounts.getHref()}>Accounts</TextLink> ·{' '}
        <TextLink to={paths.app.catalogue.getHref()}>See it as a member does</TextLink>
      </PageHeader>
      <CatalogueAdmin gear={gearPresenter} Editor={CatalogueEntryEditor} />
    </>
  );
}
