import { Dialog as HeadlessDialog, DialogBackdrop, DialogPanel, DialogTitle, Description } from '@headlessui/react';
import type { ReactNode } from 'react';

export interface DialogProps {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children?: ReactNode;
  /** The buttons along the bottom; give the safe choice `data-autofocus` so it takes the focus on open. */
  actions?: ReactNode;
}

/** A modal dialog: focus is trapped inside, Escape and the backdrop close it, focus returns on close. */
export function Dialog({ open, onClose, title, description, children, actions }: DialogProps) {
  return (
    <HeadlessDialog open={open} onClose={onClose} className="relative z-50">
      <DialogBackdrop className="fixed inset-0 bg-scree-950/50" />
      <div className="fixed inset-0 flex items-end justify-center p-4 sm:items-center">
        <DialogPanel className="w-full max-w-md rounded-xl bg-white p-6 shadow-xl">
          <DialogTitle className="text-lg font-semibold text-scree-950">{title}</DialogTitle>
          {description && <Description className="mt-2 text-scree-700">{description}</Description>}
          {children && <div className="mt-4">{children}</div>}
          {actions && <div className="mt-6 flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">{actions}</div>}
        </DialogPanel>
      </div>
    </HeadlessDialog>
  );
}
