import type { MailDelivery } from '@gramwatt/shared';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { seedAccount } from '@/testing/mocks/db';
import { partyDb } from '@/testing/mocks/party-db';
import { renderApp } from '@/testing/test-utils';

const delivery = (overrides: Partial<MailDelivery>): MailDelivery => ({
  id: '00000000-0000-4000-8000-600000000001',
  kind: 'trip-invite',
  toAddress: 'dale@example.test',
  status: 'sent',
  attempts: 1,
  lastError: null,
  createdAt: '2026-05-03T10:00:00.000Z',
  sentAt: '2026-05-03T10:00:02.000Z',
  nextAttemptAt: null,
  ...overrides,
});

describe('mail delivery for admins', () => {
  it('lists each message’s kind, recipient and delivery in words, with the last error, never the content', async () => {
    seedAccount({ role: 'admin' }, { signedIn: true });
    partyDb.deliveries.push(
      delivery({}),
      delivery({
        id: '00000000-0000-4000-8000-600000000002',
        kind: 'trip-plan',
        toAddress: 'cal@example.test',
        status: 'failed',
        attempts: 5,
        lastError: 'Connection refused',
        sentAt: null,
      }),
    );
    await renderApp('/admin/mail');
    const table = await screen.findByRole('table');
    const [, sent, failed] = within(table).getAllByRole('row');
    expect(sent).toHaveTextContent(/Trip invite.*dale@example\.test.*Sent .* \(1 try\)/);
    expect(failed).toHaveTextContent(/Plan sent home.*cal@example\.test.*Gave up after 5 tries.*Connection refused/);
  });

  it('is refused to a member', async () => {
    seedAccount({ role: 'member' }, { signedIn: true });
    await renderApp('/admin/mail');
    expect(screen.getByRole('heading', { level: 1, name: 'Not for your account' })).toBeInTheDocument();
  });
});
