import {
  catalogueEntryInputSchema,
  lockerItemInputSchema,
  lockerItemMassG,
  type CatalogueEntry,
  type LockerItem,
} from '@gramwatt/shared';
import { http, HttpResponse } from 'msw';
import { buildLockerItem } from '../locker-data';
import { sessionAccount } from './db';
import { lockerDb } from './locker-db';

const apiError = (statusCode: number, message: string, errors: Array<{ path: string; message: string }> = []) =>
  HttpResponse.json({ statusCode, message, errors }, { status: statusCode });

const validationError = (issues: Array<{ path: PropertyKey[]; message: string }>) =>
  apiError(
    400,
    'Some fields need attention',
    issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message })),
  );

const view = ({ ownerId: _ownerId, ...item }: LockerItem & { ownerId: string }): LockerItem => item;
const now = () => new Date().toISOString();

const ownItem = (id: string | undefined) => {
  const me = sessionAccount();
  return me ? lockerDb.items.find((item) => item.id === id && item.ownerId === me.id) : undefined;
};

/**
 * A fake of the locker and catalogue API with the server's contract: owner-scoped items (another member's is a
 * 404), the shared schemas for 400s with field paths, Σ grams × count over the power gear. The CSV import and
 * uploads answer only what a test sets with `server.use`; their real checks are the server's e2e tests.
 */
export const lockerHandlers = [
  http.get('/api/locker/items', () => {
    const me = sessionAccount();
    if (!me) return apiError(401, 'Sign in to continue');
    const items = lockerDb.items.filter((item) => item.ownerId === me.id);
    const totalMassG = items.reduce(
      (sum, item) => (item.kind === 'device' ? sum : sum + item.massG * item.countOwned),
      0,
    );
    return HttpResponse.json({ items: items.map(view), totalMassG });
  }),

  http.post('/api/locker/items', async ({ request }) => {
    const me = sessionAccount();
    if (!me) return apiError(401, 'Sign in to continue');
    const parsed = lockerItemInputSchema.safeParse(await request.json());
    if (!parsed.success) return validationError(parsed.error.issues);
    const item = buildLockerItem(me.id, {
      ...parsed.data,
      massG: lockerItemMassG(parsed.data.spec),
      createdAt: now(),
      updatedAt: now(),
    });
    lockerDb.items.push(item);
    return HttpResponse.json({ item: view(item) }, { status: 201 });
  }),

  http.put<{ id: string }>('/api/locker/items/:id', async ({ request, params }) => {
    const current = ownItem(params.id);
    if (!current) return apiError(404, 'No such item in your locker');
    const parsed = lockerItemInputSchema.safeParse(await request.json());
    if (!parsed.success) return validationError(parsed.error.issues);
    if (parsed.data.spec.kind !== current.kind) return apiError(409, 'An item cannot change kind');
    Object.assign(current, parsed.data, { massG: lockerItemMassG(parsed.data.spec), updatedAt: now() });
    return HttpResponse.json({ item: view(current) });
  }),

  http.delete<{ id: string }>('/api/locker/items/:id', ({ params }) => {
    const current = ownItem(params.id);
    if (!current) return apiError(404, 'No such item in your locker');
    lockerDb.items = lockerDb.items.filter((item) => item !== current);
    return new HttpResponse(null, { status: 204 });
  }),

  http.get('/api/catalogue', () => {
    if (!sessionAccount()) return apiError(401, 'Sign in to continue');
    return HttpResponse.json({ entries: lockerDb.catalogue });
  }),

  http.post<{ id: string }>('/api/catalogue/:id/copy', ({ params }) => {
    const me = sessionAccount();
    if (!me) return apiError(401, 'Sign in to continue');
    const entry = lockerDb.catalogue.find((candidate) => candidate.id === params.id);
    if (!entry) return apiError(404, 'No such catalogue entry');
    const item = buildLockerItem(me.id, { name: entry.name, notes: entry.notes, spec: entry.spec, countOwned: 1 });
    lockerDb.items.push(item);
    return HttpResponse.json({ item: view(item) }, { status: 201 });
  }),

  http.post('/api/catalogue', async ({ request }) => {
    const me = sessionAccount();
    if (!me) return apiError(401, 'Sign in to continue');
    if (me.role !== 'admin') return apiError(403, 'Admins only');
    const parsed = catalogueEntryInputSchema.safeParse(await request.json());
    if (!parsed.success) return validationError(parsed.error.issues);
    const entry: CatalogueEntry = {
      id: crypto.randomUUID(),
      kind: parsed.data.spec.kind,
      name: parsed.data.name,
      notes: parsed.data.notes,
      spec: parsed.data.spec,
      massG: lockerItemMassG(parsed.data.spec),
      createdAt: now(),
      updatedAt: now(),
    };
    lockerDb.catalogue.push(entry);
    return HttpResponse.json({ entry }, { status: 201 });
  }),
];
