import type { TripDeviceDetail } from '@gramwatt/shared';
import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderWithProviders } from '@/testing/test-utils';
import { overrideFromValues, TripDevices } from './trip-devices';

const radioDefault = {
  basis: 'radio-hours',
  transmitMinutesPerDay: 20,
  receiveHoursPerDay: 3,
  standbyHoursPerDay: 6,
} as const;

/** An invented radio on a trip whose transmit time the trip raises to 45 minutes. */
const radio = {
  id: '00000000-0000-4000-8000-000000000001',
  itemId: '00000000-0000-4000-8000-000000000002',
  name: 'Invented handheld',
  notes: '',
  massG: 250,
  defaultUseProfile: radioDefault,
  useProfileOverride: { transmitMinutesPerDay: 45 },
  useProfile: { ...radioDefault, transmitMinutesPerDay: 45 },
  overriddenFields: ['transmitMinutesPerDay'],
  overrideIssues: [],
} as unknown as TripDeviceDetail;

describe('TripDevices', () => {
  it('marks the overridden value with the locker default beside it, and offers a reset', async () => {
    server.use(http.get('*/api/locker/items', () => HttpResponse.json({ items: [] })));
    renderWithProviders(<TripDevices tripId="t" devices={[radio]} canEdit />);
    const transmit = screen.getByRole('textbox', { name: /^Transmit time/ });
    expect(transmit).toHaveValue('45');
    expect(transmit).toHaveAccessibleDescription(expect.stringContaining('locker default: 20 min/day'));
    expect(screen.getByRole('textbox', { name: /^Receive time/ })).toHaveAccessibleDescription(
      expect.stringContaining('Locker default'),
    );
    expect(screen.getByRole('button', { name: 'Reset to locker default' })).toBeInTheDocument();
  });

  it('shows no edit buttons to a viewer', () => {
    server.use(http.get('*/api/locker/items', () => HttpResponse.json({ items: [] })));
    renderWithProviders(<TripDevices tripId="t" devices={[radio]} canEdit={false} />);
    expect(screen.queryByRole('button')).toBeNull();
    expect(screen.getByRole('textbox', { name: /^Transmit time/ })).toHaveAttribute('readonly');
  });
});

describe('overrideFromValues', () => {
  it('keeps only the fields that differ from the locker default', () => {
    expect(overrideFromValues(radio, { receiveHoursPerDay: '4' })).toEqual({
      transmitMinutesPerDay: 45,
      receiveHoursPerDay: 4,
    });
  });

  it('is null when every value is the locker default again', () => {
    expect(overrideFromValues(radio, { transmitMinutesPerDay: '20' })).toBeNull();
  });
});
