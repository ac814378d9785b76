import { BadRequestException, type CallHandler, type ExecutionContext, PayloadTooLargeException } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { maxLockerFileBytes } from '@gramwatt/shared';
import type { Observable } from 'rxjs';
import { tooLargeMessage } from './locker-files.service';

/** Multipart field that carries the file. */
export const uploadFieldName = 'file';

const sendOneFileMessage = 'Send one file, in the multipart field `file`';

/**
 * Reads the multipart field `file` into memory with multer, stopping at the size limit, and turns
 * multer's terse errors into the API's messages: 413 naming the limit, 400 naming the field.
 */
export class LockerFileUploadInterceptor extends FileInterceptor(uploadFieldName, {
  limits: { fileSize: maxLockerFileBytes, files: 1, fields: 4, fieldSize: 1024, parts: 6 },
}) {
  override async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await super.intercept(context, next);
    } catch (error) {
      throw translateMulterError(error);
    }
  }
}

/** The API error for an error multer raised while reading the body. */
export function translateMulterError(error: unknown): unknown {
  if (error instanceof PayloadTooLargeException) {
    return new PayloadTooLargeException({
      message: tooLargeMessage,
      errors: [{ path: 'file', message: tooLargeMessage }],
    });
  }
  if (error instanceof BadRequestException && /unexpected|too many files/i.test(error.message)) {
    return new BadRequestException({
      message: sendOneFileMessage,
      errors: [{ path: 'file', message: sendOneFileMessage }],
    });
  }
  return error;
}

/** Thrown when the request carries no file at all. */
export function missingFileError(): BadRequestException {
  return new BadRequestException({
    message: sendOneFileMessage,
    errors: [{ path: 'file', message: sendOneFileMessage }],
  });
}
