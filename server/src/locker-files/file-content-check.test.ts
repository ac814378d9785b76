import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { checkFileContent, describeSniffedType, sniffFileType } from './file-content-check';

/**
 * Signatures from the format definitions (the check values), padded to a realistic length:
 * - ELF: e_ident starts 0x7F 'E' 'L' 'F' (System V ABI, "ELF Identification", Tool Interface Standard ELF spec v1.2).
 * - PE: an MS-DOS stub starting 'M' 'Z' (Microsoft PE Format specification, "MS-DOS Stub (Image Only)").
 * - PDF: the header line `%PDF-1.n` (ISO 32000-1:2008, 7.5.2 "File Header").
 */
const elfBytes = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00]), Buffer.alloc(120)]);
const peBytes = Buffer.concat([Buffer.from('MZ', 'ascii'), Buffer.alloc(126, 0x90)]);
const pdfBytes = Buffer.from(
  '%PDF-1.7\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n',
  'latin1',
);

const image = (format: 'png' | 'jpeg' | 'webp' | 'gif' | 'tiff') =>
  sharp({ create: { width: 8, height: 6, channels: 3, background: '#3a6b4f' } })
    .toFormat(format)
    .toBuffer();

describe('sniffFileType', () => {
  it('finds JPEG, PNG and WebP from real encoder output and PDF from its header', async () => {
    expect(await sniffFileType(await image('jpeg'))).toMatchObject({ mime: 'image/jpeg' });
    expect(await sniffFileType(await image('png'))).toMatchObject({ mime: 'image/png' });
    expect(await sniffFileType(await image('webp'))).toMatchObject({ mime: 'image/webp' });
    expect(await sniffFileType(pdfBytes)).toMatchObject({ mime: 'application/pdf' });
  });

  it('finds programs by their headers whatever they are called', async () => {
    expect(await sniffFileType(elfBytes)).toMatchObject({ ext: 'elf' });
    expect(await sniffFileType(peBytes)).toMatchObject({ ext: 'exe' });
  });

  it('finds nothing in plain text', async () => {
    expect(await sniffFileType(Buffer.from('panel,10 W\nbank,10000 mAh\n'))).toBeUndefined();
  });
});

describe('checkFileContent', () => {
  it('accepts each photo type as a photo and a PDF as a spec sheet', async () => {
    for (const format of ['jpeg', 'png', 'webp'] as const) {
      const bytes = await image(format);
      expect(checkFileContent(await sniffFileType(bytes), bytes.length, 'photo')).toEqual({
        ok: true,
        contentType: `image/${format}`,
      });
    }
    expect(checkFileContent(await sniffFileType(pdfBytes), pdfBytes.length, 'spec-sheet')).toEqual({
      ok: true,
      contentType: 'application/pdf',
    });
  });

  it('refuses programs with 415 on `file`, naming what they are', async () => {
    const elf = checkFileContent(await sniffFileType(elfBytes), elfBytes.length, 'photo');
    expect(elf).toMatchObject({ ok: false, statusCode: 415, path: 'file' });
    expect(elf.ok || elf.message).toMatch(/ELF executable/);
    const pe = checkFileContent(await sniffFileType(peBytes), peBytes.length, 'spec-sheet');
    expect(pe.ok || pe.message).toMatch(/Windows program/);
  });

  it('refuses a type it knows but does not take, naming it', async () => {
    const gif = await image('gif');
    const result = checkFileContent(await sniffFileType(gif), gif.length, 'photo');
    expect(result).toMatchObject({ ok: false, statusCode: 415, path: 'file' });
    expect(result.ok || result.message).toMatch(/GIF image/);
  });

  it('refuses a photo sent as a spec sheet and a PDF sent as a photo with 415 on `purpose`', async () => {
    const png = await image('png');
    const asSheet = checkFileContent(await sniffFileType(png), png.length, 'spec-sheet');
    expect(asSheet).toMatchObject({ ok: false, statusCode: 415, path: 'purpose' });
    expect(asSheet.ok || asSheet.message).toMatch(
      /PNG image, but purpose spec-sheet takes a PDF; send it with purpose photo/,
    );
    const asPhoto = checkFileContent(await sniffFileType(pdfBytes), pdfBytes.length, 'photo');
    expect(asPhoto).toMatchObject({ ok: false, statusCode: 415, path: 'purpose' });
  });

  it('refuses unknown content with 415 and an empty file with 400', () => {
    expect(checkFileContent(undefined, 10, 'photo')).toMatchObject({ ok: false, statusCode: 415, path: 'file' });
    expect(checkFileContent(undefined, 0, 'photo')).toMatchObject({
      ok: false,
      statusCode: 400,
      message: 'The file is empty',
    });
  });

  it('names other types by extension and media type', () => {
    expect(describeSniffedType({ ext: 'tif', mime: 'image/tiff' })).toBe('a TIF file (image/tiff)');
  });
});
