import type { ComponentProps } from 'react';
import { Link } from 'react-router-dom';
import { cn } from './cn';

/** An in-app link that reads as a link: underlined, moss, with the shared focus ring. */
export function TextLink({ className, ...props }: ComponentProps<typeof Link>) {
  return (
    <Link
      className={cn(
        'font-medium text-moss-700 underline decoration-2 underline-offset-2 hover:text-moss-900',
        className,
      )}
      {...props}
    />
  );
}
