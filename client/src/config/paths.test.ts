import { describe, expect, it } from 'vitest';
import { paths, safeRedirect } from './paths';

describe('safeRedirect', () => {
  it('keeps a path on this site', () => {
    expect(safeRedirect('/trips?sort=start')).toBe('/trips?sort=start');
  });

  it.each(['//elsewhere.example/x', 'https://elsewhere.example/', 'javascript:alert(1)', '', null, undefined])(
    'refuses %s and falls back to the locker',
    (target) => {
      expect(safeRedirect(target)).toBe(paths.app.locker.getHref());
    },
  );
});

describe('paths', () => {
  it('carries the way back on the sign-in link', () => {
    expect(paths.auth.signIn.getHref('/admin/accounts')).toBe('/sign-in?redirectTo=%2Fadmin%2Faccounts');
    expect(paths.auth.signIn.getHref()).toBe('/sign-in');
  });
});
