/** Paths in Gramwatt's e-mails that open a page of this app: an invite and a read-only share link. */
const appLinkPattern = /https?:\/\/[^\s<>"')]+?(\/(?:invites|share)\/[A-Za-z0-9_.-]+)/g;

export interface AppLink {
  /** What the link does, in words. */
  label: string;
  /** The path on this site, so the link opens here whatever public address the server wrote into the e-mail. */
  path: string;
}

/**
 * The invite and share links in a message's text part, as paths on this site (each once, in order).
 * @example appLinksIn('Open http://localhost:3000/invites/abc') // [{ label: 'Open the invite', path: '/invites/abc' }]
 */
export function appLinksIn(text: string): AppLink[] {
  const paths = [...text.matchAll(appLinkPattern)].map((match) => match[1] ?? '');
  return [...new Set(paths)]
    .filter(Boolean)
    .map((path) => ({ path, label: path.startsWith('/invites/') ? 'Open the invite' : 'Open the read-only trip' }));
}
