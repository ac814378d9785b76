/** Gramwatt's mark: a low sun over a ridge, sitting on a charge bar. Decorative; the wordmark beside it carries the name. */
export function GramwattMark({ className = 'size-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <rect x="1" y="1" width="30" height="30" rx="8" className="fill-moss-700" />
      <circle cx="19.5" cy="12.5" r="4.5" className="fill-larch-300" />
      <path d="M4 22 11 13.5 15.5 18.5 19 15 28 22Z" className="fill-firn-50" />
      <rect x="6" y="24.5" width="20" height="3" rx="1.5" className="fill-moss-300" />
    </svg>
  );
}
