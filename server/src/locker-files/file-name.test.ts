import { maxLockerFileNameLength } from '@gramwatt/shared';
import { describe, expect, it } from 'vitest';
import { cleanFileName, contentDisposition } from './file-name';

describe('cleanFileName', () => {
  it('keeps a name whose extension matches the content', () => {
    expect(cleanFileName('fold-out panel.JPG', 'image/jpeg', 'photo')).toBe(
      'fold-out panel.JPG'.replace('.JPG', '.jpg'),
    );
    expect(cleanFileName('sheet.pdf', 'application/pdf', 'spec-sheet')).toBe('sheet.pdf');
  });

  it('drops the path a browser or a crafted request adds', () => {
    expect(cleanFileName('C:\\fakepath\\panel.png', 'image/png', 'photo')).toBe('panel.png');
    expect(cleanFileName('../../etc/passwd.png', 'image/png', 'photo')).toBe('passwd.png');
  });

  it('gives the extension of the content, not the one claimed', () => {
    expect(cleanFileName('panel.jpg', 'image/png', 'photo')).toBe('panel.png');
    expect(cleanFileName('README', 'application/pdf', 'spec-sheet')).toBe('README.pdf');
  });

  it('removes control and direction-override characters', () => {
    // U+202E would show "gnp.exe" reversed as "exe.png"-looking text.
    expect(cleanFileName('bad\u202Egnp.exe\u0007.webp', 'image/webp', 'photo')).toBe('badgnp.exe.webp');
  });

  it('names an empty or dot-only name after the purpose', () => {
    expect(cleanFileName('', 'image/jpeg', 'photo')).toBe('photo.jpg');
    expect(cleanFileName('.pdf', 'application/pdf', 'spec-sheet')).toBe('spec-sheet.pdf');
  });

  it('shortens a long name to the limit and keeps the extension', () => {
    const name = cleanFileName(`${'ä'.repeat(400)}.png`, 'image/png', 'photo');
    expect(Array.from(name)).toHaveLength(maxLockerFileNameLength);
    expect(name.endsWith('.png')).toBe(true);
  });
});

describe('contentDisposition', () => {
  it('writes the RFC 6266 appendix D form with an ASCII fallback', () => {
    // RFC 8187 section 3.2.3 example: "€ rates" is encoded as %E2%82%AC%20rates.
    expect(contentDisposition('attachment', '€ rates.pdf')).toBe(
      `attachment; filename="_ rates.pdf"; filename*=UTF-8''%E2%82%AC%20rates.pdf`,
    );
  });

  it('escapes quotes and the characters attr-char leaves out', () => {
    expect(contentDisposition('inline', `a"b'(c)*.png`)).toBe(
      `inline; filename="a_b'(c)*.png"; filename*=UTF-8''a%22b%27%28c%29%2A.png`,
    );
  });
});
