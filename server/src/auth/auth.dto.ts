import { signInSchema, signUpSchema } from '@gramwatt/shared';
import { createZodDto } from 'nestjs-zod';

export class SignUpDto extends createZodDto(signUpSchema) {}
export class SignInDto extends createZodDto(signInSchema) {}
