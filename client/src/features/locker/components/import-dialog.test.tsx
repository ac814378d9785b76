import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { seedAccount } from '@/testing/mocks/db';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';

interface ImportCall {
  mode: string | null;
  commit: string | null;
  /** The file's text. (Its name does not survive jsdom's FormData into Node's fetch; the browser test sends a real one.) */
  text: string | undefined;
}

const banksCsv = 'kind,name,count_owned,mass_g,capacity_mah\nbank,Pocket bank,1,200,10000\nbank,Brick bank,1,x,20000\n';

/** A fake import route: answers with `answer(commit)` and records what was sent. */
const fakeImport = (answer: (commit: boolean) => Response) => {
  const calls: ImportCall[] = [];
  server.use(
    http.post('/api/locker/import', async ({ request }) => {
      const url = new URL(request.url);
      const form = await request.formData();
      // The file arrives as the runtime's own File class, not jsdom's: read it by its shape.
      const file = form.get('file') as { text?: () => Promise<string> } | null;
      calls.push({
        mode: url.searchParams.get('mode'),
        commit: url.searchParams.get('commit'),
        text: await file?.text?.(),
      });
      return answer(url.searchParams.get('commit') === 'true');
    }),
  );
  return calls;
};

const openImport = async () => {
  seedAccount({}, { signedIn: true });
  const view = await renderApp('/locker');
  await view.user.click(await screen.findByRole('button', { name: 'Import a CSV file' }));
  const dialog = within(await screen.findByRole('dialog', { name: 'Import gear from a CSV file' }));
  return { ...view, dialog };
};

describe('ImportDialog', () => {
  it('checks the file first and shows the row-by-row report; nothing can be imported while rows are bad', async () => {
    const calls = fakeImport(() =>
      HttpResponse.json({
        ok: false,
        mode: 'add',
        committed: false,
        rowCount: 2,
        report: [{ row: 3, column: 'mass_g', message: 'Mass must be a number' }],
        preview: [{ row: 2, kind: 'bank', name: 'Pocket bank', countOwned: 1, massG: 200 }],
      }),
    );
    const { user, dialog } = await openImport();

    await user.upload(dialog.getByLabelText('CSV file'), new File([banksCsv], 'banks.csv', { type: 'text/csv' }));
    await user.click(dialog.getByRole('button', { name: 'Check the file' }));

    const report = await dialog.findByRole('table', { name: /problems found/i });
    const [, row] = within(report).getAllByRole('row');
    expect(
      within(row!)
        .getAllByRole('cell')
        .map((cell) => cell.textContent),
    ).toEqual(['3', 'mass_g', 'Mass must be a number']);
    expect(dialog.getByRole('alert')).toHaveTextContent('Nothing has been imported');
    expect(dialog.queryByRole('button', { name: /^Import/ })).not.toBeInTheDocument();
    expect(calls).toEqual([{ mode: 'add', commit: 'false', text: banksCsv }]);
  });

  it('imports a good file after the preview, in the chosen mode, and reports how many items came in', async () => {
    const result = (committed: boolean) => ({
      ok: true,
      mode: 'replace',
      committed,
      rowCount: 2,
      report: [],
      preview: [
        { row: 2, kind: 'bank', name: 'Pocket bank', countOwned: 1, massG: 200 },
        { row: 3, kind: 'bank', name: 'Brick bank', countOwned: 2, massG: 410 },
      ],
    });
    const calls = fakeImport((commit) => HttpResponse.json(result(commit)));
    const { user, dialog } = await openImport();

    await user.upload(dialog.getByLabelText('CSV file'), new File([banksCsv], 'banks.csv', { type: 'text/csv' }));
    await user.click(dialog.getByRole('radio', { name: /Replace my locker/ }));
    await user.click(dialog.getByRole('button', { name: 'Check the file' }));

    const preview = await dialog.findByRole('table', { name: 'The items the file holds' });
    expect(within(preview).getByRole('rowheader', { name: 'Brick bank' })).toBeInTheDocument();
    await user.click(dialog.getByRole('button', { name: 'Replace with 2 items' }));

    expect(await screen.findByText('Locker replaced with 2 items.')).toBeInTheDocument();
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(calls.map(({ mode, commit }) => `${mode}/${commit}`)).toEqual(['replace/false', 'replace/true']);
  });

  it('shows the report when the commit is refused with a 400', async () => {
    fakeImport((commit) =>
      commit
        ? HttpResponse.json(
            {
              statusCode: 400,
              message: 'Nothing was imported: the file has a problem',
              errors: [{ path: 'rows.2.name', message: 'Name is required' }],
              ok: false,
              mode: 'add',
              committed: false,
              rowCount: 1,
              report: [{ row: 2, column: 'name', message: 'Name is required' }],
              preview: [],
            },
            { status: 400 },
          )
        : HttpResponse.json({
            ok: true,
            mode: 'add',
            committed: false,
            rowCount: 1,
            report: [],
            preview: [{ row: 2, kind: 'bank', name: 'Pocket bank', countOwned: 1, massG: 200 }],
          }),
    );
    const { user, dialog } = await openImport();
    await user.upload(dialog.getByLabelText('CSV file'), new File([banksCsv], 'banks.csv', { type: 'text/csv' }));
    await user.click(dialog.getByRole('button', { name: 'Check the file' }));
    await user.click(await dialog.findByRole('button', { name: 'Import 1 item' }));

    const report = await dialog.findByRole('table', { name: /problems found/i });
    expect(within(report).getByRole('cell', { name: 'Name is required' })).toBeInTheDocument();
  });

  it('says plainly when the server refuses the file as too large (413)', async () => {
    fakeImport(() =>
      HttpResponse.json({ statusCode: 413, message: 'The file is over 1 MB', errors: [] }, { status: 413 }),
    );
    const { user, dialog } = await openImport();
    await user.upload(dialog.getByLabelText('CSV file'), new File([banksCsv], 'banks.csv', { type: 'text/csv' }));
    await user.click(dialog.getByRole('button', { name: 'Check the file' }));
    expect(await dialog.findByRole('alert')).toHaveTextContent('The file is over 1 MB');
  });
});
