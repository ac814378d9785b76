import { zodResolver } from '@hookform/resolvers/zod';
import { minPasswordLength, signUpSchema, type Account } from '@gramwatt/shared';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { useSignUp } from '../api/sign-up';
import { applyServerErrors } from './apply-server-errors';

const fieldNames = ['displayName', 'email', 'password'] as const;

export interface SignUpFormProps {
  onSuccess: (account: Account) => void;
}

export function SignUpForm({ onSuccess }: SignUpFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({
    resolver: zodResolver(signUpSchema),
    defaultValues: { displayName: '', email: '', password: '' },
  });
  const signUp = useSignUp({ onSuccess });

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    signUp.mutate(values, {
      onError: (error) => {
        // A taken e-mail belongs next to the e-mail field.
        if (isApiError(error, 409) && error.errors.length === 0) {
          setError('email', { type: 'server', message: error.message }, { shouldFocus: true });
          return;
        }
        setFormError(applyServerErrors(error, fieldNames, setError));
      },
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="sign-up-heading" className="flex flex-col gap-5">
      {formError && (
        <Alert tone="error" title="Could not create the account">
          {formError}
        </Alert>
      )}
      <TextField
        label="Name"
        hint="How your hiking partners will see you."
        autoComplete="nickname"
        error={errors.displayName?.message}
        {...register('displayName')}
      />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        error={errors.email?.message}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${minPasswordLength} characters.`}
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" isLoading={signUp.isPending} className="mt-1 w-full">
        Create account
      </Button>
    </form>
  );
}
