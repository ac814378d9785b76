import { HttpException } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';

/** Plain messages for the errors Express's body parsers raise before a route runs, by their `type`. */
export const bodyParserMessages: Readonly<Record<string, string>> = {
  'entity.parse.failed': 'The request body is not valid JSON',
  'entity.too.large': 'The request body is too large',
  'entity.verify.failed': 'The request body could not be verified',
  'encoding.unsupported': 'The request body uses an unsupported encoding',
  'charset.unsupported': 'The request body uses an unsupported charset',
  'request.aborted': 'The request was aborted',
  'request.size.invalid': 'The request body does not match its length',
  'stream.encoding.set': 'The request body could not be read',
  'parameters.too.many': 'The request body has too many parameters',
};

/**
 * Express error middleware, mounted right after the body parsers: turns their errors into HttpExceptions
 * with a plain message (the parser's own message can echo the body), so the one exception filter answers
 * them in the API error shape.
 */
export function translateBodyParserErrors(
  error: unknown,
  _request: Request,
  _response: Response,
  next: NextFunction,
): void {
  if (error instanceof Error) {
    const { type, status } = error as Error & { type?: unknown; status?: unknown };
    if (typeof type === 'string' && typeof status === 'number' && status >= 400 && status < 500) {
      next(new HttpException(bodyParserMessages[type] ?? 'The request body could not be read', status));
      return;
    }
  }
  next(error);
}
