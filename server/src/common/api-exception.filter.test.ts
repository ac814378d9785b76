import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  HttpException,
  HttpStatus,
  NotFoundException,
} from '@nestjs/common';
import { ThrottlerException } from '@nestjs/throttler';
import { signUpSchema } from '@gramwatt/shared';
import { ZodSerializationException, ZodValidationException } from 'nestjs-zod';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { ApiExceptionFilter } from './api-exception.filter';

const filter = new ApiExceptionFilter();
// The filter logs unexpected errors; keep the test output clean.
Object.assign(filter, { logger: { error: () => undefined } });

function zodErrorOf(schema: z.ZodType, value: unknown): z.ZodError {
  const result = schema.safeParse(value);
  if (result.success) throw new Error('expected the value to be invalid');
  return result.error;
}

describe('ApiExceptionFilter', () => {
  it('turns zod issues into field errors with dotted paths', () => {
    const schema = z.object({
      devices: z.array(z.object({ transmitCurrentA: z.number().positive({ error: 'Must be above 0 A' }) })),
    });
    const body = filter.toApiError(
      new ZodValidationException(zodErrorOf(schema, { devices: [{ transmitCurrentA: 1 }, { transmitCurrentA: -2 }] })),
    );
    expect(body).toEqual({
      statusCode: 400,
      message: 'Must be above 0 A',
      errors: [{ path: 'devices.1.transmitCurrentA', message: 'Must be above 0 A' }],
    });
  });

  it('gives a summary message when several fields fail', () => {
    const body = filter.toApiError(new ZodValidationException(zodErrorOf(signUpSchema, { email: 'x', password: 'y' })));
    expect(body.statusCode).toBe(400);
    expect(body.message).toBe('Some fields need attention');
    expect(body.errors.map((e) => e.path).sort()).toEqual(['displayName', 'email', 'password']);
  });

  it('keeps the status and message of an HttpException', () => {
    expect(filter.toApiError(new NotFoundException('No such trip'))).toEqual({
      statusCode: 404,
      message: 'No such trip',
      errors: [],
    });
    expect(filter.toApiError(new ForbiddenException())).toEqual({ statusCode: 403, message: 'Forbidden', errors: [] });
    expect(filter.toApiError(new HttpException('Too large', HttpStatus.PAYLOAD_TOO_LARGE))).toEqual({
      statusCode: 413,
      message: 'Too large',
      errors: [],
    });
  });

  it('passes field errors given with an exception', () => {
    const body = filter.toApiError(
      new ConflictException({ message: 'Taken', errors: [{ path: 'email', message: 'Taken' }, { bogus: true }] }),
    );
    expect(body).toEqual({ statusCode: 409, message: 'Taken', errors: [{ path: 'email', message: 'Taken' }] });
  });

  it('uses the first of several messages (Nest built-in pipes give a list)', () => {
    const body = filter.toApiError(new BadRequestException(['first problem', 'second problem']));
    expect(body).toEqual({ statusCode: 400, message: 'first problem', errors: [] });
  });

  it('answers 429 for the throttler', () => {
    expect(filter.toApiError(new ThrottlerException('Slow down')).statusCode).toBe(429);
  });

  it('hides the detail of an unexpected error behind a 500', () => {
    const body = filter.toApiError(new Error('connect ECONNREFUSED 10.0.0.5:5432 password=hunter2'));
    expect(body).toEqual({ statusCode: 500, message: 'Something went wrong on our side', errors: [] });
    expect(JSON.stringify(filter.toApiError('a thrown string'))).not.toContain('thrown string');
  });

  it('hides a response that failed its schema behind a 500', () => {
    const error = zodErrorOf(z.object({ id: z.string() }), { id: 1 });
    expect(filter.toApiError(new ZodSerializationException(error))).toEqual({
      statusCode: 500,
      message: 'Something went wrong on our side',
      errors: [],
    });
  });

  it('keeps the 4xx status of a middleware error (http-errors style)', () => {
    const error = Object.assign(new Error('Unsupported Media Type'), { status: 415 });
    expect(filter.toApiError(error)).toEqual({ statusCode: 415, message: 'Unsupported Media Type', errors: [] });
    const serverSide = Object.assign(new Error('boom'), { status: 502 });
    expect(filter.toApiError(serverSide).statusCode).toBe(500);
  });
});
