import { describe, expect, it } from 'vitest';
import { appLinksIn } from './app-links';

describe('appLinksIn', () => {
  it('turns invite and share links into paths on this site, whatever host the e-mail names', () => {
    const text = [
      'Open the invite: http://localhost:3000/invites/Abc_-123',
      'Read-only: https://gw.example.test/share/eyJ0.eyJ1.c2ln',
    ].join('\n');
    expect(appLinksIn(text)).toEqual([
      { label: 'Open the invite', path: '/invites/Abc_-123' },
      { label: 'Open the read-only trip', path: '/share/eyJ0.eyJ1.c2ln' },
    ]);
  });

  it('lists a link that appears twice once, and ignores other addresses', () => {
    const text = 'http://a.test/invites/x1 and again http://a.test/invites/x1; see http://a.test/trips/9';
    expect(appLinksIn(text)).toEqual([{ label: 'Open the invite', path: '/invites/x1' }]);
  });

  it('finds nothing in a message without links', () => {
    expect(appLinksIn('No links here.')).toEqual([]);
  });
});
