import { z } from 'zod';

/** One field-level problem: `path` is the dotted field path (`"devices.0.transmitCurrentA"`), empty for the whole request. */
export const apiFieldErrorSchema = z.object({ path: z.string(), message: z.string() });
export type ApiFieldError = z.infer<typeof apiFieldErrorSchema>;

/**
 * The one error shape every API route answers with (status codes per product brief "Conventions":
 * 400 validation, 401 not signed in, 403 a role you lack, 404 not yours or not there, 409 conflict,
 * 413 too large, 415 wrong type, 422 cannot be solved as asked, 503 solver busy).
 */
export const apiErrorSchema = z.object({
  statusCode: z.number().int(),
  message: z.string(),
  errors: z.array(apiFieldErrorSchema),
});
export type ApiError = z.infer<typeof apiErrorSchema>;
