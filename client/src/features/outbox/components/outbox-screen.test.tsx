import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { seedAccount } from '@/testing/mocks/db';
import { partyDb } from '@/testing/mocks/party-db';
import { renderApp } from '@/testing/test-utils';

const message = (to: string, subject: string, text: string) => ({
  id: `00000000-0000-4000-8000-7000000000${String(partyDb.outbox.length).padStart(2, '0')}`,
  receivedAt: '2026-05-03T10:00:00.000Z',
  from: 'Gramwatt <mail@gramwatt.test>',
  to,
  subject,
  preview: text.slice(0, 140),
  text,
  html: `<p>${text}</p><script>parent.document.title = 'taken'</script>`,
  messageId: null,
});

const mainNav = () => screen.getAllByRole('navigation', { name: 'Main' })[0]!;

describe('the outbox', () => {
  it('lists only my messages, opens one with its text, an in-app invite button and the HTML in an empty sandbox', async () => {
    partyDb.outboxLocal = true;
    seedAccount({ email: 'dale@example.test' }, { signedIn: true });
    partyDb.outbox.push(
      message(
        'dale@example.test',
        'Ash invited you to "Invented ridge walk"',
        'Open the invite: http://gramwatt.test/invites/tok-1',
      ),
      message('someone@example.test', 'Not for Dale', 'Private'),
    );
    const { user } = await renderApp('/outbox');

    expect(await within(mainNav()).findByRole('link', { name: 'Outbox' })).toHaveAttribute('aria-current', 'page');
    const list = await screen.findByRole('navigation', { name: 'Messages' });
    expect(within(list).getAllByRole('link')).toHaveLength(1);
    expect(screen.queryByText('Not for Dale')).toBeNull();

    await user.click(within(list).getByRole('link', { name: /Invented ridge walk/ }));
    const article = within(await screen.findByRole('article', { name: /Invented ridge walk/ }));
    expect(article.getByText(/Open the invite: http:\/\/gramwatt\.test\/invites\/tok-1/)).toBeInTheDocument();
    expect(article.getByRole('link', { name: 'Open the invite' })).toHaveAttribute('href', '/invites/tok-1');

    await user.click(screen.getByRole('tab', { name: 'As formatted' }));
    const frame = screen.getByTitle(/The formatted part of/);
    expect(frame).toHaveAttribute('sandbox', '');
    expect(document.title).not.toBe('taken');
  });

  it('says so when nothing was sent to me yet', async () => {
    partyDb.outboxLocal = true;
    seedAccount({}, { signedIn: true });
    await renderApp('/outbox');
    expect(await screen.findByRole('region', { name: 'Nothing for you yet' })).toBeInTheDocument();
  });

  it('is not in the menu, and explains itself, while mail goes to a real server', async () => {
    seedAccount({}, { signedIn: true });
    await renderApp('/outbox');
    expect(await screen.findByText(/messages are in your own mailbox instead/)).toBeInTheDocument();
    expect(within(mainNav()).queryByRole('link', { name: 'Outbox' })).toBeNull();
  });
});
