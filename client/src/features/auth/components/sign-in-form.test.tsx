import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { testPassword } from '@/testing/data';
import { seedAccount } from '@/testing/mocks/db';
import { server } from '@/testing/mocks/server';
import { renderWithProviders } from '@/testing/test-utils';
import { SignInForm } from './sign-in-form';

const setup = () => {
  const onSuccess = vi.fn();
  const signInCalls = vi.fn();
  server.events.on('request:start', ({ request }) => {
    if (request.url.endsWith('/api/auth/sign-in')) signInCalls();
  });
  return { onSuccess, signInCalls, ...renderWithProviders(<SignInForm onSuccess={onSuccess} />) };
};

describe('SignInForm', () => {
  it('shows inline errors for an empty e-mail and password without calling the server', async () => {
    const { user, onSuccess, signInCalls } = setup();
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const email = screen.getByLabelText('E-mail');
    expect(email).toHaveAttribute('aria-invalid', 'true');
    expect(email).toHaveAccessibleDescription('Enter a valid e-mail address');
    expect(screen.getByLabelText('Password')).toHaveAccessibleDescription('Password is required');
    expect(signInCalls).not.toHaveBeenCalled();
    expect(onSuccess).not.toHaveBeenCalled();
  });

  it('shows an inline error for a malformed e-mail and clears it once corrected', async () => {
    const { user } = setup();
    await user.type(screen.getByLabelText('E-mail'), 'ridge-walker.example.test');
    await user.type(screen.getByLabelText('Password'), testPassword);
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(screen.getByLabelText('E-mail')).toHaveAccessibleDescription('Enter a valid e-mail address');

    await user.clear(screen.getByLabelText('E-mail'));
    await user.type(screen.getByLabelText('E-mail'), 'ridge@walker.example.test');
    expect(screen.getByLabelText('E-mail')).not.toHaveAttribute('aria-invalid');
  });

  it('shows the server message when the e-mail or password is wrong (401)', async () => {
    seedAccount({ email: 'tarn@example.test' });
    const { user, onSuccess } = setup();
    await user.type(screen.getByLabelText('E-mail'), 'tarn@example.test');
    await user.type(screen.getByLabelText('Password'), 'not-the-right-one');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Could not sign in');
    expect(alert).toHaveTextContent('E-mail or password is wrong');
    expect(onSuccess).not.toHaveBeenCalled();
  });

  it('says so when the server cannot be reached, rather than blaming the password', async () => {
    server.use(http.post('/api/auth/sign-in', () => HttpResponse.error()));
    const { user } = setup();
    await user.type(screen.getByLabelText('E-mail'), 'tarn@example.test');
    await user.type(screen.getByLabelText('Password'), testPassword);
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(/could not reach the server/i);
  });

  it('signs in with a trimmed, lower-cased e-mail and hands over the account', async () => {
    const account = seedAccount({ email: 'tarn@example.test' });
    const { user, onSuccess } = setup();
    await user.type(screen.getByLabelText('E-mail'), '  Tarn@Example.TEST ');
    await user.type(screen.getByLabelText('Password'), testPassword);
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await vi.waitFor(() => expect(onSuccess).toHaveBeenCalledWith(account));
  });
});
