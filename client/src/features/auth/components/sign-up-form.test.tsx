import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { testPassword } from '@/testing/data';
import { seedAccount } from '@/testing/mocks/db';
import { server } from '@/testing/mocks/server';
import { renderWithProviders } from '@/testing/test-utils';
import { SignUpForm } from './sign-up-form';

const setup = () => {
  const onSuccess = vi.fn();
  return { onSuccess, ...renderWithProviders(<SignUpForm onSuccess={onSuccess} />) };
};

const fillIn = async (
  user: ReturnType<typeof setup>['user'],
  { name = 'Fen Lowe', email = 'fen@example.test', password = testPassword } = {},
) => {
  await user.type(screen.getByLabelText('Name'), name);
  await user.type(screen.getByLabelText('E-mail'), email);
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Create account' }));
};

describe('SignUpForm', () => {
  it('asks for a password of at least 10 characters before calling the server', async () => {
    const { user, onSuccess } = setup();
    await fillIn(user, { password: 'short' });
    expect(screen.getByLabelText('Password')).toHaveAccessibleDescription(
      expect.stringContaining('Password needs at least 10 characters'),
    );
    expect(onSuccess).not.toHaveBeenCalled();
  });

  it('puts a field error from a server 400 onto that field', async () => {
    server.use(
      http.post('/api/auth/sign-up', () =>
        HttpResponse.json(
          {
            statusCode: 400,
            message: 'Some fields need attention',
            errors: [{ path: 'displayName', message: 'Name may not be only punctuation' }],
          },
          { status: 400 },
        ),
      ),
    );
    const { user, onSuccess } = setup();
    await fillIn(user, { name: '...' });

    const name = await screen.findByLabelText('Name');
    await vi.waitFor(() =>
      expect(name).toHaveAccessibleDescription(expect.stringContaining('Name may not be only punctuation')),
    );
    expect(name).toHaveAttribute('aria-invalid', 'true');
    expect(name).toHaveFocus();
    // Every error found a field, so no extra message above the form.
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
    expect(onSuccess).not.toHaveBeenCalled();
  });

  it('shows the message of a 400 whose field the form does not have', async () => {
    server.use(
      http.post('/api/auth/sign-up', () =>
        HttpResponse.json(
          { statusCode: 400, message: 'Sign-up is closed on this server', errors: [{ path: '', message: 'closed' }] },
          { status: 400 },
        ),
      ),
    );
    const { user } = setup();
    await fillIn(user);
    expect(await screen.findByRole('alert')).toHaveTextContent('Sign-up is closed on this server');
  });

  it('shows a taken e-mail (409) beside the e-mail field', async () => {
    seedAccount({ email: 'fen@example.test' });
    const { user, onSuccess } = setup();
    await fillIn(user);

    const email = screen.getByLabelText('E-mail');
    await vi.waitFor(() => expect(email).toHaveAccessibleDescription('An account with this e-mail already exists'));
    expect(onSuccess).not.toHaveBeenCalled();
  });

  it('shows a 409 without field paths beside the e-mail field too', async () => {
    server.use(
      http.post('/api/auth/sign-up', () =>
        HttpResponse.json({ statusCode: 409, message: 'That e-mail is already in use', errors: [] }, { status: 409 }),
      ),
    );
    const { user } = setup();
    await fillIn(user);
    await vi.waitFor(() =>
      expect(screen.getByLabelText('E-mail')).toHaveAccessibleDescription('That e-mail is already in use'),
    );
  });

  it('creates the account (signed in by the server) and hands it over', async () => {
    const { user, onSuccess } = setup();
    await fillIn(user);
    await vi.waitFor(() =>
      expect(onSuccess).toHaveBeenCalledWith(
        expect.objectContaining({ email: 'fen@example.test', displayName: 'Fen Lowe' }),
      ),
    );
  });
});
