import {
  BadRequestException,
  type CallHandler,
  type ExecutionContext,
  Injectable,
  type NestInterceptor,
  PayloadTooLargeException,
  UnsupportedMediaTypeException,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { maxLockerCsvBytes } from '@gramwatt/shared';
import { type Observable, catchError, throwError } from 'rxjs';

/** The multipart field the CSV travels in. */
export const csvFieldName = 'file';

/** The part of a multer file this route reads (multer keeps it in memory: no `dest` is set). */
export interface UploadedCsvFile {
  buffer: Buffer;
  size: number;
  mimetype: string;
  originalname: string;
}

export const csvTooLargeMessage = `The file is larger than 1 MB (${maxLockerCsvBytes.toLocaleString('en')} bytes); split it into smaller files`;
export const csvMissingMessage = `Attach the CSV file in the multipart field "${csvFieldName}"`;
export const csvWrongTypeMessage = 'This is not a CSV or text file; export your sheet as CSV (UTF-8)';

/** Reads the upload into memory, at most one file of at most 1 MB (multer limits; the rest of the form is tiny). */
export const CsvFileInterceptor = FileInterceptor(csvFieldName, {
  limits: { fileSize: maxLockerCsvBytes, files: 1, fields: 5, parts: 6 },
});

/** Turns multer's terse errors into the locker's messages (413 over the size limit, 400 for another field). */
@Injectable()
export class CsvUploadErrorsInterceptor implements NestInterceptor {
  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next.handle().pipe(
      catchError((error: unknown) => {
        if (error instanceof PayloadTooLargeException)
          return throwError(() => new PayloadTooLargeException(csvTooLargeMessage));
        if (error instanceof BadRequestException && /unexpected (file )?field|too many/i.test(error.message)) {
          return throwError(
            () =>
              new BadRequestException({
                message: csvMissingMessage,
                errors: [{ path: csvFieldName, message: csvMissingMessage }],
              }),
          );
        }
        return throwError(() => error);
      }),
    );
  }
}

/** Declared types browsers and tools send for CSV (spreadsheets on some systems say vnd.ms-excel). */
const csvContentTypes = new Set([
  'text/csv',
  'text/plain',
  'text/comma-separated-values',
  'text/x-csv',
  'application/csv',
  'application/x-csv',
  'application/vnd.ms-excel',
  'application/octet-stream',
]);

/**
 * The uploaded file's bytes, once it is known to be text: 400 when there is no file, 415 when its declared
 * type is not a CSV/text type or its content holds NUL bytes (a binary file renamed `.csv`).
 */
export function csvBytes(file: UploadedCsvFile | undefined): Uint8Array {
  if (!file)
    throw new BadRequestException({
      message: csvMissingMessage,
      errors: [{ path: csvFieldName, message: csvMissingMessage }],
    });
  const declared = file.mimetype.split(';')[0]?.trim().toLowerCase() ?? '';
  if (!csvContentTypes.has(declared) || file.buffer.includes(0)) {
    throw new UnsupportedMediaTypeException({
      message: csvWrongTypeMessage,
      errors: [{ path: csvFieldName, message: csvWrongTypeMessage }],
    });
  }
  return file.buffer;
}
