import { type ArgumentsHost, Catch, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import { ApiExceptionFilter } from '../common/api-exception.filter';
import { PlanSolverBusyException } from './plan-solver';

/** The busy planner's 503 in the one error shape, with `Retry-After` in seconds (RFC 9110 §10.2.3). */
@Catch(PlanSolverBusyException)
export class PlanSolverBusyFilter implements ExceptionFilter {
  private readonly errors = new ApiExceptionFilter();

  catch(exception: PlanSolverBusyException, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    if (response.headersSent) return;
    const body = this.errors.toApiError(exception);
    response.setHeader('Retry-After', String(exception.retryAfterS));
    response.status(body.statusCode).json(body);
  }
}
