import { Menu, MenuButton, MenuItem, MenuItems, MenuSeparator } from '@headlessui/react';
import type { ComponentProps, ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { cn } from './cn';

/** A drop-down menu (Headless UI): arrow keys move between items, Escape closes, focus returns to the button. */
export const DropdownMenu = Menu;

export function DropdownMenuButton({ className, ...props }: ComponentProps<typeof MenuButton>) {
  return (
    <MenuButton
      className={cn(
        'inline-flex min-h-11 items-center gap-2 rounded-lg px-3 font-medium transition-colors',
        'hover:bg-scree-800 data-open:bg-scree-800',
        typeof className === 'string' ? className : undefined,
      )}
      {...props}
    />
  );
}

export function DropdownMenuItems({ children, header }: { children: ReactNode; header?: ReactNode }) {
  return (
    <MenuItems
      anchor={{ to: 'bottom end', gap: 6 }}
      modal={false}
      className="z-40 w-64 rounded-xl border border-scree-200 bg-white p-1.5 text-scree-900 shadow-lg focus:outline-none"
    >
      {header && (
        <>
          <div className="px-3 py-2">{header}</div>
          <MenuSeparator className="my-1 h-px bg-scree-200" />
        </>
      )}
      {children}
    </MenuItems>
  );
}

const itemClasses = 'flex w-full items-center rounded-lg px-3 py-2.5 text-left data-focus:bg-firn-200';

export function DropdownMenuAction({ onClick, children }: { onClick: () => void; children: ReactNode }) {
  return (
    <MenuItem>
      <button type="button" onClick={onClick} className={itemClasses}>
        {children}
      </button>
    </MenuItem>
  );
}

export function DropdownMenuLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <MenuItem>
      <Link to={to} className={itemClasses}>
        {children}
      </Link>
    </MenuItem>
  );
}
