import { zodResolver } from '@hookform/resolvers/zod';
import { signInSchema, type Account } from '@gramwatt/shared';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { useSignIn } from '../api/sign-in';
import { applyServerErrors } from './apply-server-errors';

const fieldNames = ['email', 'password'] as const;

export interface SignInFormProps {
  onSuccess: (account: Account) => void;
}

export function SignInForm({ onSuccess }: SignInFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });
  const signIn = useSignIn({ onSuccess });

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    signIn.mutate(values, { onError: (error) => setFormError(applyServerErrors(error, fieldNames, setError)) });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="sign-in-heading" className="flex flex-col gap-5">
      {formError && (
        <Alert tone="error" title="Could not sign in">
          {formError}
        </Alert>
      )}
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
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" isLoading={signIn.isPending} className="mt-1 w-full">
        Sign in
      </Button>
    </form>
  );
}
