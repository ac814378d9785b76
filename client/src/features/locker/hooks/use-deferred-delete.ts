import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { deleteLockerItem, deleteLockerItemOnUnload } from '../api/delete-locker-item';
import { getLockerItemsQueryOptions } from '../api/get-locker-items';
import type { LockerItem } from '../api/types';

/** How long a deleted item can be brought back before the DELETE is sent: 6 s, long enough to read the notice. */
export const undoWindowMs = 6_000;

export interface DeferredDelete {
  /** Items shown as deleted whose DELETE has not been sent yet (or is on its way). */
  pending: LockerItem[];
  /** Hides the item now and sends the DELETE when the undo window ends. */
  schedule: (item: LockerItem) => void;
  /** Brings the item back; nothing was sent, so nothing needs restoring on the server. */
  undo: (itemId: string) => void;
  /** The last delete the server refused, to tell the member the item is back. */
  failure: { item: LockerItem; message: string } | null;
  dismissFailure: () => void;
}

/**
 * Delete with undo, honestly: the row disappears at once, but the DELETE goes out only when the undo window
 * closes, so "Undo" never has to re-create anything. Leaving the page inside the window sends the DELETE then
 * (with `keepalive` when the tab closes), so what the member saw happen does happen.
 */
export const useDeferredDelete = (windowMs: number = undoWindowMs): DeferredDelete => {
  const queryClient = useQueryClient();
  const [pending, setPending] = useState<LockerItem[]>([]);
  const [failure, setFailure] = useState<DeferredDelete['failure']>(null);
  const timers = useRef(new Map<string, ReturnType<typeof setTimeout>>());

  const forget = useCallback((itemId: string) => setPending((items) => items.filter((item) => item.id !== itemId)), []);

  const send = useCallback(
    async (item: LockerItem) => {
      timers.current.delete(item.id);
      try {
        await deleteLockerItem(item.id);
        // Keep the row hidden until the refetched list no longer has it.
        await queryClient.invalidateQueries({ queryKey: getLockerItemsQueryOptions().queryKey });
      } catch (error) {
        setFailure({ item, message: error instanceof Error ? error.message : 'The server refused the delete.' });
      } finally {
        forget(item.id);
      }
    },
    [forget, queryClient],
  );

  const schedule = useCallback(
    (item: LockerItem) => {
      setFailure(null);
      setPending((items) => [...items.filter((other) => other.id !== item.id), item]);
      timers.current.set(
        item.id,
        setTimeout(() => void send(item), windowMs),
      );
    },
    [send, windowMs],
  );

  const undo = useCallback(
    (itemId: string) => {
      const timer = timers.current.get(itemId);
      if (timer === undefined) return;
      clearTimeout(timer);
      timers.current.delete(itemId);
      forget(itemId);
    },
    [forget],
  );

  useEffect(() => {
    const pendingTimers = timers.current;
    const flushOnUnload = () => {
      for (const [itemId, timer] of pendingTimers) {
        clearTimeout(timer);
        deleteLockerItemOnUnload(itemId);
      }
      pendingTimers.clear();
    };
    window.addEventListener('pagehide', flushOnUnload);
    return () => {
      window.removeEventListener('pagehide', flushOnUnload);
      // Leaving the locker inside the undo window: the delete the member saw still happens.
      for (const [itemId, timer] of pendingTimers) {
        clearTimeout(timer);
        void deleteLockerItem(itemId)
          .catch(() => undefined)
          .finally(() => void queryClient.invalidateQueries({ queryKey: getLockerItemsQueryOptions().queryKey }));
      }
      pendingTimers.clear();
    };
  }, [queryClient]);

  return { pending, schedule, undo, failure, dismissFailure: () => setFailure(null) };
};
