import { accountUpdateSchema, signInSchema, signUpSchema, type Account } from '@gramwatt/shared';
import { http, HttpResponse } from 'msw';
import { buildAccount } from '../data';
import { db, sessionAccount } from './db';
import { lockerHandlers } from './locker-handlers';
import { partyHandlers } from './party-handlers';

const apiError = (statusCode: number, message: string, errors: Array<{ path: string; message: string }> = []) =>
  HttpResponse.json({ statusCode, message, errors }, { status: statusCode });

const validationError = (issues: Array<{ path: PropertyKey[]; message: string }>) =>
  apiError(
    400,
    'Some fields need attention',
    issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message })),
  );

const takenMessage = 'An account with this e-mail already exists';

const unauthorised = () => apiError(401, 'Sign in to continue');

/** A fake of the API's auth and admin routes, following the same contract as the server. */
export const handlers = [
  http.get('/api/auth/me', () => {
    const account = sessionAccount();
    return account ? HttpResponse.json({ account }) : unauthorised();
  }),

  http.post('/api/auth/sign-in', async ({ request }) => {
    const parsed = signInSchema.safeParse(await request.json());
    if (!parsed.success) return validationError(parsed.error.issues);
    const account = db.accounts.find((candidate) => candidate.email === parsed.data.email);
    if (!account || db.passwords.get(account.email) !== parsed.data.password)
      return apiError(401, 'E-mail or password is wrong');
    if (account.disabled) return apiError(401, 'This account is disabled');
    db.sessionAccountId = account.id;
    return HttpResponse.json({ account });
  }),

  http.post('/api/auth/sign-up', async ({ request }) => {
    const parsed = signUpSchema.safeParse(await request.json());
    if (!parsed.success) return validationError(parsed.error.issues);
    if (db.accounts.some((account) => account.email === parsed.data.email))
      return apiError(409, takenMessage, [{ path: 'email', message: takenMessage }]);
    const account = buildAccount({ email: parsed.data.email, displayName: parsed.data.displayName });
    db.accounts.push(account);
    db.passwords.set(account.email, parsed.data.password);
    db.sessionAccountId = account.id;
    return HttpResponse.json({ account }, { status: 201 });
  }),

  http.post('/api/auth/sign-out', () => {
    db.sessionAccountId = null;
    return new HttpResponse(null, { status: 204 });
  }),

  http.get('/api/admin/accounts', () => {
    const me = sessionAccount();
    if (!me) return unauthorised();
    if (me.role !== 'admin') return apiError(403, 'Admins only');
    return HttpResponse.json({ accounts: db.accounts });
  }),

  http.patch<{ id: string }>('/api/admin/accounts/:id', async ({ request, params }) => {
    const me = sessionAccount();
    if (!me) return unauthorised();
    if (me.role !== 'admin') return apiError(403, 'Admins only');
    const parsed = accountUpdateSchema.safeParse(await request.json());
    if (!parsed.success) return validationError(parsed.error.issues);
    const index = db.accounts.findIndex((account) => account.id === params.id);
    const current = db.accounts[index];
    if (!current) return apiError(404, 'No such account');
    const updated: Account = { ...current, ...parsed.data };
    const after = db.accounts.map((account) => (account.id === updated.id ? updated : account));
    const adminsLeft = after.filter((account) => account.role === 'admin' && !account.disabled);
    if (adminsLeft.length === 0)
      return apiError(409, 'Gramwatt needs at least one admin: make someone else an admin first');
    db.accounts[index] = updated;
    return HttpResponse.json({ account: updated });
  }),

  ...lockerHandlers,
  ...partyHandlers,
];
