import { zodResolver } from '@hookform/resolvers/zod';
import { inviteCreateSchema, type InviteCreate } from '@gramwatt/shared';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { useCreateInvite } from '../api/create-invite';
import { inviteRoleOptions, roleMeaning } from '../utils/party-format';

const fieldNames = ['email', 'role'] as const;

/** The leader invites an address as partner or viewer; the server e-mails a single-use link. */
export function InviteForm({ tripId }: { tripId: string }) {
  const create = useCreateInvite();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<InviteCreate>({
    resolver: zodResolver(inviteCreateSchema),
    defaultValues: { email: '', role: 'partner' },
  });

  const onSubmit = handleSubmit((data) => {
    setSentTo(null);
    setFormError(null);
    create.mutate(
      { tripId, data },
      {
        onSuccess: (invite) => {
          setSentTo(invite.email);
          reset({ email: '', role: data.role });
        },
        onError: (error) => {
          // 409: the address already belongs to someone on the trip — that is about the e-mail field.
          if (isApiError(error, 409))
            return setError('email', { type: 'server', message: error.message }, { shouldFocus: true });
          const onFields = isApiError(error) ? error.errors.filter((e) => fieldNames.some((f) => f === e.path)) : [];
          onFields.forEach((e, i) =>
            setError(
              e.path as (typeof fieldNames)[number],
              { type: 'server', message: e.message },
              { shouldFocus: i === 0 },
            ),
          );
          if (onFields.length === 0) setFormError(error.message);
        },
      },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="party-invite-heading" className="flex flex-col gap-4">
      <h3 id="party-invite-heading" className="font-semibold text-scree-950">
        Invite someone by e-mail
      </h3>
      <div aria-live="polite">
        {sentTo && (
          <Alert tone="done" title="Invite sent">
            {sentTo} gets a link that works once. Inviting the same address again replaces it.
          </Alert>
        )}
        {formError && (
          <Alert tone="error" title="The invite was not sent">
            {formError}
          </Alert>
        )}
      </div>
      <TextField
        label="E-mail address"
        type="email"
        autoComplete="off"
        inputMode="email"
        error={errors.email?.message}
        className="max-w-md"
        {...register('email')}
      />
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-medium text-scree-900">Joins as</legend>
        {inviteRoleOptions.map((option) => (
          <label
            key={option.value}
            className="flex cursor-pointer items-start gap-3 rounded-lg border-2 border-scree-200 bg-white p-3 has-checked:border-moss-600"
          >
            <input
              type="radio"
              value={option.value}
              className="mt-1 size-4 accent-moss-700"
              aria-describedby={`invite-role-${option.value}`}
              {...register('role')}
            />
            <span>
              <span className="font-medium text-scree-950">{option.label}</span>
              <span id={`invite-role-${option.value}`} className="block text-sm text-scree-700">
                {roleMeaning[option.value]}
              </span>
            </span>
          </label>
        ))}
        {errors.role?.message && <p className="text-sm font-medium text-rosehip-700">{errors.role.message}</p>}
      </fieldset>
      <div>
        <Button type="submit" isLoading={create.isPending}>
          Send invite
        </Button>
      </div>
    </form>
  );
}
