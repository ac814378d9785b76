import type { LockerFile } from '../api/types';

/** The item's first photo as a small square, or a plain placeholder of the same size. Decorative: the name is beside it. */
export function ItemThumb({ files }: { files: readonly LockerFile[] }) {
  const photo = files.find((file) => file.purpose === 'photo' && file.thumbUrl);
  if (photo?.thumbUrl)
    return (
      <img
        src={photo.thumbUrl}
        alt=""
        width={40}
        height={40}
        loading="lazy"
        className="size-10 shrink-0 rounded-md border border-scree-200 bg-firn-100 object-cover"
      />
    );
  return (
    <span
      aria-hidden="true"
      className="flex size-10 shrink-0 items-center justify-center rounded-md bg-firn-100 text-scree-300"
    >
      <svg viewBox="0 0 24 24" className="size-5" fill="none" stroke="currentColor" strokeWidth="1.8">
        <rect x="3.5" y="6" width="17" height="12" rx="2.5" />
        <path d="M8 6V4.5h8V6" strokeLinecap="round" />
      </svg>
    </span>
  );
}
