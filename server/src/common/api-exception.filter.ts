import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { ApiError, ApiFieldError } from '@gramwatt/shared';
import type { Response } from 'express';
import { ZodSerializationException, ZodValidationException } from 'nestjs-zod';
import { ZodError } from 'zod';

/** An error from Express middleware that carries a client-error `status` (as http-errors does). */
interface HttpLikeError {
  status: number;
  message: string;
}

const internalErrorMessage = 'Something went wrong on our side';

/**
 * Turns every error into the one API error shape `{ statusCode, message, errors: [{ path, message }] }`.
 * Zod issues become field errors with dotted paths; unexpected errors become a 500 with no detail
 * (the stack goes to the log, never to the client).
 */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = this.toApiError(exception);
    if (response.headersSent) return;
    response.status(body.statusCode).json(body);
  }

  /** The API error for any thrown value. */
  toApiError(exception: unknown): ApiError {
    if (exception instanceof ZodValidationException) {
      return validationError(exception.getZodError());
    }
    if (exception instanceof ZodSerializationException) {
      const zodError = exception.getZodError();
      this.logger.error(
        `Response did not match its schema: ${zodError instanceof ZodError ? zodError.message : String(zodError)}`,
      );
      return internalError();
    }
    if (exception instanceof HttpException) {
      return fromHttpException(exception);
    }
    if (isHttpLikeError(exception)) {
      return { statusCode: exception.status, message: exception.message, errors: [] };
    }
    this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    return internalError();
  }
}

function validationError(error: unknown): ApiError {
  const issues = error instanceof ZodError ? error.issues : [];
  const errors: ApiFieldError[] = issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
  return {
    statusCode: HttpStatus.BAD_REQUEST,
    message: errors.length === 1 && errors[0] ? errors[0].message : 'Some fields need attention',
    errors,
  };
}

function fromHttpException(exception: HttpException): ApiError {
  const statusCode = exception.getStatus();
  const payload = exception.getResponse();
  if (statusCode >= 500) {
    return { statusCode, message: statusCode === 500 ? internalErrorMessage : exception.message, errors: [] };
  }
  if (typeof payload === 'string') return { statusCode, message: payload, errors: [] };
  const { message, errors } = payload as { message?: unknown; errors?: unknown };
  const fieldErrors = Array.isArray(errors) ? errors.filter(isFieldError) : [];
  if (Array.isArray(message)) {
    const texts = message.map(String);
    return { statusCode, message: texts[0] ?? exception.message, errors: fieldErrors };
  }
  return { statusCode, message: typeof message === 'string' ? message : exception.message, errors: fieldErrors };
}

function internalError(): ApiError {
  return { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, message: internalErrorMessage, errors: [] };
}

function isFieldError(value: unknown): value is ApiFieldError {
  return (
    typeof value === 'object' &&
    value !== null &&
    typeof (value as ApiFieldError).path === 'string' &&
    typeof (value as ApiFieldError).message === 'string'
  );
}

function isHttpLikeError(value: unknown): value is HttpLikeError {
  if (!(value instanceof Error)) return false;
  const status = (value as Partial<HttpLikeError>).status;
  return typeof status === 'number' && status >= 400 && status < 500;
}
