import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { panelSpec, seedLockerItem } from '@/testing/locker-data';
import { seedAccount } from '@/testing/mocks/db';
import { lockerDb } from '@/testing/mocks/locker-db';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';

const fileId = '00000000-0000-4000-a000-000000000001';

/** A fake upload route that stores the file on the item, as the server would, and records the purpose. */
const fakeUpload = () => {
  const purposes: unknown[] = [];
  server.use(
    http.post<{ id: string }>('/api/locker/items/:id/files', async ({ request, params }) => {
      const form = await request.formData();
      purposes.push(form.get('purpose'));
      const item = lockerDb.items.find((candidate) => candidate.id === params.id)!;
      const url = `/api/locker/items/${item.id}/files/${fileId}`;
      const file = {
        id: fileId,
        purpose: 'photo' as const,
        contentType: 'image/png',
        sizeBytes: 68,
        fileName: 'ridge.png',
        createdAt: '2026-04-02T08:00:00.000Z',
        url,
        thumbUrl: `${url}/thumb`,
      };
      item.files.push(file);
      return HttpResponse.json({ file }, { status: 201 });
    }),
  );
  return purposes;
};

const openEditor = async () => {
  const me = seedAccount({}, { signedIn: true });
  const item = seedLockerItem(me.id, { name: 'Ridge fold-out', spec: panelSpec() });
  const view = await renderApp('/locker');
  await view.user.click(await screen.findByRole('button', { name: 'Edit Ridge fold-out' }));
  const panel = within(await screen.findByRole('dialog', { name: 'Edit Ridge fold-out' }));
  return { ...view, panel, item };
};

describe('ItemFiles', () => {
  it('uploads a photo, lists it in the panel and shows its thumbnail in the table', async () => {
    const purposes = fakeUpload();
    const { user, panel, item } = await openEditor();
    expect(panel.getByText(/No files yet/)).toBeInTheDocument();

    await user.upload(
      panel.getByLabelText('Add a photo'),
      new File([new Uint8Array(68)], 'ridge.png', { type: 'image/png' }),
    );

    expect(await panel.findByRole('link', { name: 'ridge.png' })).toHaveAttribute(
      'href',
      `/api/locker/items/${item.id}/files/${fileId}`,
    );
    expect(purposes).toEqual(['photo']);
    await user.click(panel.getByRole('button', { name: 'Cancel' }));
    const row = screen.getByRole('rowheader', { name: /Ridge fold-out/ });
    expect(row.querySelector('img')).toHaveAttribute('src', `/api/locker/items/${item.id}/files/${fileId}/thumb`);
  });

  it('shows the server’s reason when it refuses a file by its content (415)', async () => {
    server.use(
      http.post('/api/locker/items/:id/files', () =>
        HttpResponse.json(
          { statusCode: 415, message: 'This file is not a JPEG, PNG or WebP image.', errors: [] },
          { status: 415 },
        ),
      ),
    );
    const { user, panel } = await openEditor();
    await user.upload(
      panel.getByLabelText('Add a photo'),
      new File(['MZ not a picture'], 'tool.png', { type: 'image/png' }),
    );
    const alert = await panel.findByRole('alert');
    expect(alert).toHaveTextContent('This file is not a JPEG, PNG or WebP image.');
  });

  it('stops a file over 5 MB before sending it', async () => {
    const purposes = fakeUpload();
    const { user, panel } = await openEditor();
    const big = new File([new Uint8Array(5 * 1024 * 1024 + 1)], 'huge.pdf', { type: 'application/pdf' });
    await user.upload(panel.getByLabelText('Add a spec sheet'), big);
    expect(await panel.findByRole('alert')).toHaveTextContent(
      'huge.pdf is larger than 5 MB, the most a spec sheet may be.',
    );
    expect(purposes).toEqual([]);
  });
});
