import { QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { describe, expect, it } from 'vitest';
import { phoneSpec, seedLockerItem } from '@/testing/locker-data';
import { seedAccount } from '@/testing/mocks/db';
import { tripsQueryKey } from '@/lib/react-query';
import { createTestQueryClient } from '@/testing/test-utils';
import { useDeleteLockerItem } from './delete-locker-item';
import { useSaveLockerItem } from './save-locker-item';

/** A query client holding a cached trip list and one trip, as the app would after visiting them. */
const withCachedTrips = () => {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData([...tripsQueryKey], { trips: [] });
  queryClient.setQueryData([...tripsQueryKey, 'trip-1'], { id: 'trip-1' });
  const wrapper = ({ children }: { children: ReactNode }) => (
    <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
  );
  const tripsInvalidated = () =>
    [[...tripsQueryKey], [...tripsQueryKey, 'trip-1']].map((key) => queryClient.getQueryState(key)?.isInvalidated);
  return { wrapper, tripsInvalidated };
};

// Trips show their devices' locker specs (and their chosen kit's "trip changed" caution reads the devices' change
// times), so a device edited or deleted in the locker must not leave a trip page a minute stale.
describe('locker changes refresh the cached trips', () => {
  it('after saving an item', async () => {
    const owner = seedAccount({}, { signedIn: true });
    const phone = seedLockerItem(owner.id, { spec: phoneSpec() });
    const { wrapper, tripsInvalidated } = withCachedTrips();
    const { result } = renderHook(() => useSaveLockerItem(), { wrapper });
    expect(tripsInvalidated()).toEqual([false, false]);
    await act(() =>
      result.current.mutateAsync({
        itemId: phone.id,
        body: { name: phone.name, notes: '', countOwned: 1, spec: phone.spec },
      }),
    );
    expect(tripsInvalidated()).toEqual([true, true]);
  });

  it('after deleting an item', async () => {
    const owner = seedAccount({}, { signedIn: true });
    const phone = seedLockerItem(owner.id, { spec: phoneSpec() });
    const { wrapper, tripsInvalidated } = withCachedTrips();
    const { result } = renderHook(() => useDeleteLockerItem(), { wrapper });
    await act(() => result.current.mutateAsync(phone.id));
    expect(tripsInvalidated()).toEqual([true, true]);
  });
});
