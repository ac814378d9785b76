import { Dialog, DialogBackdrop, DialogPanel, DialogTitle, Description } from '@headlessui/react';
import type { ReactNode } from 'react';

export interface SidePanelProps {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children: ReactNode;
}

/**
 * A modal panel along the right edge (the whole screen on a phone) for forms too long for a centred dialog.
 * Headless UI traps focus inside, closes on Escape and returns focus to what opened it.
 */
export function SidePanel({ open, onClose, title, description, children }: SidePanelProps) {
  return (
    <Dialog open={open} onClose={onClose} className="relative z-50">
      <DialogBackdrop className="fixed inset-0 bg-scree-950/50" />
      <div className="fixed inset-0 flex justify-end">
        <DialogPanel className="flex h-full w-full max-w-2xl flex-col overflow-y-auto bg-white shadow-xl">
          <div className="flex items-start justify-between gap-4 border-b-2 border-firn-200 px-6 py-4">
            <div>
              <DialogTitle className="text-xl font-semibold text-scree-950">{title}</DialogTitle>
              {description && <Description className="mt-1 text-sm text-scree-700">{description}</Description>}
            </div>
            <button
              type="button"
              onClick={onClose}
              aria-label="Close"
              className="inline-flex size-11 shrink-0 items-center justify-center rounded-lg text-scree-700 hover:bg-firn-200"
            >
              <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true">
                <path d="m5 5 10 10M15 5 5 15" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
              </svg>
            </button>
          </div>
          <div className="flex-1 px-6 pt-5">{children}</div>
        </DialogPanel>
      </div>
    </Dialog>
  );
}
