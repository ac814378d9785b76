import { fireEvent, screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderWithProviders } from '@/testing/test-utils';
import { TripForm } from './trip-form';

/** An invented two-day track (no real place): 3 points heading north-east. */
const goodGpx = `<?xml version="1.0"?>
<gpx version="1.1" creator="test" xmlns="http://www.topografix.com/GPX/1/1">
  <trk><name>Invented ridge</name><trkseg>
    <trkpt lat="45.1000" lon="7.1000"></trkpt>
    <trkpt lat="45.1200" lon="7.1200"></trkpt>
    <trkpt lat="45.1400" lon="7.1400"></trkpt>
  </trkseg></trk>
</gpx>`;

const upload = (text: string, name = 'route.gpx') => {
  const input = screen.getByLabelText(/GPX route or track/);
  fireEvent.change(input, { target: { files: [new File([text], name, { type: 'application/gpx+xml' })] } });
};

const renderForm = () => {
  const onSaved = vi.fn();
  const view = renderWithProviders(<TripForm onSaved={onSaved} onCancel={() => {}} />);
  return { ...view, onSaved };
};

describe('TripForm', () => {
  it('shows the schema’s messages beside the fields and sends nothing when required fields are empty', async () => {
    const posted = vi.fn();
    server.use(http.post('*/api/trips', () => (posted(), HttpResponse.json({}, { status: 500 }))));
    const { user } = renderForm();
    await user.click(screen.getByRole('button', { name: 'Create trip' }));
    expect(await screen.findByRole('textbox', { name: /^Name/ })).toHaveAccessibleDescription(
      expect.stringContaining('Name is required'),
    );
    expect(screen.getByRole('textbox', { name: /^Latitude/ })).toHaveAttribute('aria-invalid', 'true');
    expect(posted).not.toHaveBeenCalled();
  });

  it('shows a reserve above 100 % in percent, not as an API share', async () => {
    const { user } = renderForm();
    const reserve = screen.getByRole('textbox', { name: /^Reserve/ });
    await user.clear(reserve);
    await user.type(reserve, '120');
    await user.click(screen.getByRole('button', { name: 'Create trip' }));
    expect(reserve).toHaveAccessibleDescription(expect.stringContaining('Reserve must be from 0 to below 100 %'));
  });

  it('places a server 400 field error beside its field', async () => {
    server.use(
      http.post('*/api/trips', () =>
        HttpResponse.json(
          { statusCode: 400, message: 'Invalid', errors: [{ path: 'gramLimitG', message: 'Gram limit too odd' }] },
          { status: 400 },
        ),
      ),
    );
    const { user } = renderForm();
    await user.type(screen.getByRole('textbox', { name: /^Name/ }), 'Invented loop');
    fireEvent.change(screen.getByLabelText(/^Start date/), { target: { value: '2027-07-01' } });
    await user.type(screen.getByRole('textbox', { name: /^Latitude/ }), '45.1');
    await user.type(screen.getByRole('textbox', { name: /^Longitude/ }), '7.1');
    await user.type(screen.getByRole('textbox', { name: /^Gram limit/ }), '900');
    await user.click(screen.getByRole('button', { name: 'Create trip' }));
    expect(await screen.findByRole('textbox', { name: /^Gram limit/ })).toHaveAccessibleDescription(
      expect.stringContaining('Gram limit too odd'),
    );
  });

  it('fills the start point and the walking days from a good GPX file', async () => {
    renderForm();
    upload(goodGpx);
    expect(await screen.findByRole('table', { name: /Walking days/ })).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: /^Latitude/ })).toHaveValue('45.1');
    expect(screen.getByRole('textbox', { name: /^Longitude/ })).toHaveValue('7.1');
  });

  it.each([
    ['not XML', 'this is not a gpx file'],
    ['no points', '<?xml version="1.0"?><gpx version="1.1" xmlns="http://www.topografix.com/GPX/1/1"></gpx>'],
    ['out of range', goodGpx.replace('lat="45.1000"', 'lat="95.0000"')],
  ])('a bad GPX file (%s) gets a message by the upload and leaves the place empty', async (_case, text) => {
    renderForm();
    upload(text);
    expect(await screen.findByRole('alert')).toHaveTextContent('The trip is unchanged.');
    expect(screen.getByRole('textbox', { name: /^Latitude/ })).toHaveValue('');
  });

  it('refuses a 20 MB file before reading it', async () => {
    renderForm();
    const big = new File(['x'], 'big.gpx');
    Object.defineProperty(big, 'size', { value: 20 * 1024 * 1024 });
    fireEvent.change(screen.getByLabelText(/GPX route or track/), { target: { files: [big] } });
    expect(await screen.findByRole('alert')).toHaveTextContent(/MB/);
  });
});
