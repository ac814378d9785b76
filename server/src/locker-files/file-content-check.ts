import {
  type LockerFileContentType,
  type LockerFilePurpose,
  lockerFileContentTypes,
  photoContentTypes,
  specSheetContentTypes,
} from '@gramwatt/shared';
import { fileTypeFromBuffer } from 'file-type';

/** What the bytes of a file are, by their magic numbers (file-type's signature table). */
export interface SniffedType {
  /** Media type, e.g. `image/png`, `application/x-elf`. */
  mime: string;
  /** Usual extension, e.g. `png`, `elf`, `exe`. */
  ext: string;
}

/** Reads the type from the first bytes of the content; undefined when no known signature matches. */
export async function sniffFileType(bytes: Uint8Array): Promise<SniffedType | undefined> {
  const found = await fileTypeFromBuffer(bytes);
  return found && { mime: found.mime, ext: found.ext };
}

/** A file that passed: the content type it will be stored and served with. */
export interface AcceptedFile {
  ok: true;
  contentType: LockerFileContentType;
}

/** A file that failed, with the status to answer, the field to blame and a message naming the problem. */
export interface RejectedFile {
  ok: false;
  statusCode: 400 | 415;
  path: 'file' | 'purpose';
  message: string;
}

const acceptedLabels: Record<LockerFileContentType, string> = {
  'image/jpeg': 'a JPEG image',
  'image/png': 'a PNG image',
  'image/webp': 'a WebP image',
  'application/pdf': 'a PDF document',
};

/** Names for the things people most often send by mistake; anything else is named by its extension and type. */
const knownOtherLabels: Record<string, string> = {
  elf: 'a program (ELF executable)',
  exe: 'a Windows program (EXE)',
  'mach-o': 'a macOS program (Mach-O)',
  gif: 'a GIF image',
  heic: 'a HEIC image',
  zip: 'a ZIP archive',
};

const wantedByPurpose: Record<LockerFilePurpose, string> = {
  photo: 'a JPEG, PNG or WebP image',
  'spec-sheet': 'a PDF',
};

function isAccepted(mime: string): mime is LockerFileContentType {
  return (
    (photoContentTypes as readonly string[]).includes(mime) ||
    (specSheetContentTypes as readonly string[]).includes(mime)
  );
}

/** Describes sniffed content for a message: "a PNG image", "a program (ELF executable)", "a TIFF file (image/tiff)". */
export function describeSniffedType(sniffed: SniffedType): string {
  if (isAccepted(sniffed.mime)) return acceptedLabels[sniffed.mime];
  return knownOtherLabels[sniffed.ext] ?? `a ${sniffed.ext.toUpperCase()} file (${sniffed.mime})`;
}

/**
 * Decides whether content may be stored for `purpose`, from its sniffed type only: the file name and the
 * type the browser declared are never consulted, so a renamed program stays a program.
 *
 * @example
 * checkFileContent({ mime: 'image/png', ext: 'png' }, 1024, 'spec-sheet').ok // false: 415 naming `purpose`
 */
export function checkFileContent(
  sniffed: SniffedType | undefined,
  sizeBytes: number,
  purpose: LockerFilePurpose,
): AcceptedFile | RejectedFile {
  if (sizeBytes === 0) return { ok: false, statusCode: 400, path: 'file', message: 'The file is empty' };
  if (!sniffed) {
    return {
      ok: false,
      statusCode: 415,
      path: 'file',
      message: 'The file is not a JPEG, PNG or WebP photo or a PDF spec sheet: its content matches none of them',
    };
  }
  if (!isAccepted(sniffed.mime)) {
    return {
      ok: false,
      statusCode: 415,
      path: 'file',
      message: `The file is ${describeSniffedType(sniffed)}, not a JPEG, PNG or WebP photo or a PDF spec sheet (its name does not matter: the content decides)`,
    };
  }
  if (!lockerFileContentTypes[purpose].includes(sniffed.mime)) {
    const other: LockerFilePurpose = purpose === 'photo' ? 'spec-sheet' : 'photo';
    return {
      ok: false,
      statusCode: 415,
      path: 'purpose',
      message: `The file is ${acceptedLabels[sniffed.mime]}, but purpose ${purpose} takes ${wantedByPurpose[purpose]}; send it with purpose ${other}`,
    };
  }
  return { ok: true, contentType: sniffed.mime };
}
