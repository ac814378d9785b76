import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { expect } from 'vitest';
import { createAppRoutes } from '@/app/router';
import { AppProvider } from '@/app/provider';
import { createQueryClient, queryConfig } from '@/lib/react-query';

/** A query client like the app's, without retries so errors show at once. */
export const createTestQueryClient = () =>
  createQueryClient({ ...queryConfig, queries: { ...queryConfig.queries, retry: false }, mutations: { retry: false } });

/** Renders one component with the app's providers (no router). */
export const renderWithProviders = (ui: ReactElement) => {
  const queryClient = createTestQueryClient();
  const user = userEvent.setup();
  const result = render(<QueryClientProvider client={queryClient}>{ui}</QueryClientProvider>);
  return { ...result, user, queryClient };
};

/** Renders the whole app (real routes, lazy modules, loaders) at `url`, against the MSW fake of the API. */
export const renderApp = async (url: string) => {
  const queryClient = createTestQueryClient();
  const router = createMemoryRouter(createAppRoutes(queryClient), { initialEntries: [url] });
  const user = userEvent.setup();
  const result = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  await waitFor(() => {
    expect(router.state.initialized).toBe(true);
    expect(router.state.navigation.state).toBe('idle');
  });
  // Every page has one h1; once it is there the lazy page has rendered (and set its title).
  await screen.findByRole('heading', { level: 1 });
  return { ...result, user, queryClient, router };
};
