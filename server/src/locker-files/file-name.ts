import { type LockerFileContentType, type LockerFilePurpose, maxLockerFileNameLength } from '@gramwatt/shared';

/** The extensions a name may keep for each stored type; the first is used when the name has none of them. */
const extensionsByType: Record<LockerFileContentType, readonly string[]> = {
  'image/jpeg': ['jpg', 'jpeg'],
  'image/png': ['png'],
  'image/webp': ['webp'],
  'application/pdf': ['pdf'],
};

/** C0 and C1 control characters, and the bidirectional overrides that can make a name read backwards. */
// eslint-disable-next-line no-control-regex -- matching control characters is the point: they are stripped from names.
const unsafeCharacters = /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g;

/**
 * The name to store and offer for an uploaded file: the last path segment of what the browser sent,
 * without control characters, at most {@link maxLockerFileNameLength} characters, and ending in an
 * extension that matches the content (so `panel.jpg` holding a PNG is kept as `panel.png`).
 *
 * @example
 * cleanFileName('C:\\fakepath\\panel.jpg', 'image/png', 'photo') // 'panel.png'
 */
export function cleanFileName(raw: string, contentType: LockerFileContentType, purpose: LockerFilePurpose): string {
  const lastSegment = raw.split(/[\\/]/).pop() ?? '';
  const cleaned = lastSegment.normalize('NFC').replace(unsafeCharacters, '').replace(/\s+/g, ' ').trim();
  const dot = cleaned.lastIndexOf('.');
  const extension = dot >= 0 ? cleaned.slice(dot + 1) : '';
  const allowed = extensionsByType[contentType];
  const keepsExtension = allowed.includes(extension.toLowerCase());
  // A short alphanumeric tail is an extension and is replaced; anything else ("v2.1 final") stays in the stem.
  const hasExtension = dot >= 0 && /^[a-z0-9]{1,5}$/i.test(extension);
  const stem = (hasExtension ? cleaned.slice(0, dot) : cleaned).replace(/^[.\s]+/, '').trim() || purpose;
  const suffix = `.${keepsExtension ? extension.toLowerCase() : allowed[0]}`;
  const chars = Array.from(stem);
  const room = maxLockerFileNameLength - suffix.length;
  return (chars.length > room ? chars.slice(0, room).join('').trimEnd() : stem) + suffix;
}

/**
 * Percent-encodes a value for an RFC 8187 `ext-value` (`UTF-8''…`): everything outside `attr-char`
 * is encoded (RFC 8187, section 3.2.1; `encodeURIComponent` leaves `'()*` alone, which attr-char excludes).
 */
function encodeExtValue(value: string): string {
  return encodeURIComponent(value).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
}

/**
 * A `Content-Disposition` header value with a plain-ASCII `filename` for old clients and the exact name
 * in `filename*` (RFC 6266, section 4.3 and appendix D).
 *
 * @example
 * contentDisposition('attachment', 'Fiche technique – 10 W.pdf')
 * // `attachment; filename="Fiche technique _ 10 W.pdf"; filename*=UTF-8''Fiche%20technique%20%E2%80%93%2010%20W.pdf`
 */
export function contentDisposition(type: 'inline' | 'attachment', fileName: string): string {
  const fallback = fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  return `${type}; filename="${fallback}"; filename*=UTF-8''${encodeExtValue(fileName)}`;
}
