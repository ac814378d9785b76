import type { TripDeviceDetail, UseProfile, UseProfileField, UseProfileOverride } from '@gramwatt/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { useLockerDevices } from '../api/get-locker-devices';
import { useAddTripDevice, useRemoveTripDevice, useUpdateTripDevice } from '../api/trip-devices';

interface FieldInfo {
  label: string;
  unit: string;
  /** Shown on screen as value × scale (shares as percent). */
  scale: number;
}

const fieldInfo: Record<UseProfileField, FieldInfo> = {
  transmitMinutesPerDay: { label: 'Transmit time', unit: 'min/day', scale: 1 },
  receiveHoursPerDay: { label: 'Receive time', unit: 'h/day', scale: 1 },
  standbyHoursPerDay: { label: 'Standby time', unit: 'h/day', scale: 1 },
  batterySharePerDay: { label: 'Battery used per day', unit: '%', scale: 100 },
  energyWhPerDay: { label: 'Energy per day', unit: 'Wh/day', scale: 1 },
};

/** The use-profile fields of a profile, in screen order. */
export function profileFields(profile: UseProfile): UseProfileField[] {
  return (Object.keys(fieldInfo) as UseProfileField[]).filter((key) => key in profile);
}

const profileValue = (profile: UseProfile, field: UseProfileField): number | undefined =>
  (profile as Partial<Record<UseProfileField, number>>)[field];

const shown = (value: number | undefined, field: UseProfileField) =>
  value === undefined ? '' : String(Math.round(value * fieldInfo[field].scale * 100) / 100);

/**
 * The override to store: only the fields that differ from the locker default (all of them, with the
 * basis, when the trip uses another basis than the default).
 */
export function overrideFromValues(
  device: Pick<TripDeviceDetail, 'defaultUseProfile' | 'useProfile'>,
  typed: Partial<Record<UseProfileField, string>>,
): UseProfileOverride | null {
  const basisChanged = device.useProfile.basis !== device.defaultUseProfile.basis;
  const override: UseProfileOverride = basisChanged ? { basis: device.useProfile.basis } : {};
  for (const field of profileFields(device.useProfile)) {
    const text = typed[field] ?? shown(profileValue(device.useProfile, field), field);
    const value = Number(text.replace(',', '.')) / fieldInfo[field].scale;
    const fallback = profileValue(device.defaultUseProfile, field);
    if (basisChanged || fallback === undefined || Math.abs(value - fallback) > 1e-9) override[field] = value;
  }
  return Object.keys(override).length === 0 ? null : override;
}

function DeviceCard({ tripId, device, canEdit }: { tripId: string; device: TripDeviceDetail; canEdit: boolean }) {
  const update = useUpdateTripDevice();
  const remove = useRemoveTripDevice();
  const [typed, setTyped] = useState<Partial<Record<UseProfileField, string>>>({});
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const overridden = new Set(device.overriddenFields);

  const send = async (useProfileOverride: UseProfileOverride | null) => {
    setErrors({});
    setMessage(null);
    try {
      await update.mutateAsync({ tripId, deviceId: device.id, useProfileOverride });
      setTyped({});
      setMessage(useProfileOverride ? 'Saved for this trip.' : 'Back to the locker default.');
    } catch (error) {
      if (isApiError(error, 400)) {
        setErrors(Object.fromEntries(error.errors.map((e) => [e.path.split('.').pop() ?? e.path, e.message])));
      } else setMessage(error instanceof Error ? error.message : 'Saving failed.');
    }
  };

  return (
    <li className="rounded-xl border-2 border-scree-200 bg-white p-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="font-semibold text-scree-950">{device.name}</h3>
        <span className="text-sm text-scree-600">{device.massG} g, carried anyway</span>
      </div>
      {device.overrideIssues.length > 0 && (
        <Alert tone="caution" title="The trip’s change no longer fits the locker item">
          {device.overrideIssues.map((i) => i.message).join(' ')} The locker default applies.
        </Alert>
      )}
      <form
        className="mt-3 grid gap-3 sm:grid-cols-3"
        onSubmit={(event) => {
          event.preventDefault();
          void send(overrideFromValues(device, typed));
        }}
      >
        {profileFields(device.useProfile).map((field) => {
          const info = fieldInfo[field];
          const isOverridden = overridden.has(field);
          const fallback = shown(profileValue(device.defaultUseProfile, field), field);
          return (
            <TextField
              key={field}
              label={info.label}
              unit={info.unit}
              inputMode="decimal"
              readOnly={!canEdit}
              value={typed[field] ?? shown(profileValue(device.useProfile, field), field)}
              onChange={(event) => setTyped((t) => ({ ...t, [field]: event.target.value }))}
              hint={
                isOverridden ? `Changed for this trip (locker default: ${fallback} ${info.unit})` : 'Locker default'
              }
              error={errors[field]}
            />
          );
        })}
        {canEdit && (
          <div className="flex flex-wrap gap-2 sm:col-span-3">
            <Button type="submit" size="sm" disabled={update.isPending}>
              Save for this trip
            </Button>
            {device.useProfileOverride && (
              <Button type="button" size="sm" variant="secondary" onClick={() => void send(null)}>
                Reset to locker default
              </Button>
            )}
            <Button
              type="button"
              size="sm"
              variant="quiet"
              onClick={() => remove.mutate({ tripId, deviceId: device.id })}
            >
              Take off this trip
            </Button>
          </div>
        )}
      </form>
      {message && (
        <p role="status" className="mt-2 text-sm text-scree-700">
          {message}
        </p>
      )}
    </li>
  );
}

/** The trip's devices with their use profiles for this trip, and adding devices from the member's locker. */
export function TripDevices({
  tripId,
  devices,
  canEdit,
}: {
  tripId: string;
  devices: TripDeviceDetail[];
  canEdit: boolean;
}) {
  const locker = useLockerDevices();
  const add = useAddTripDevice();
  const [itemId, setItemId] = useState('');
  const onTrip = new Set(devices.map((d) => d.itemId));
  const choices = (locker.data ?? []).filter((item) => !onTrip.has(item.id));

  return (
    <section aria-labelledby="trip-devices-heading" className="flex flex-col gap-3">
      <h2 id="trip-devices-heading" className="text-lg font-semibold text-scree-900">
        Devices
      </h2>
      {devices.length === 0 && <p className="text-scree-700">No devices on this trip yet.</p>}
      <ul className="flex flex-col gap-3">
        {devices.map((device) => (
          <DeviceCard key={device.id} tripId={tripId} device={device} canEdit={canEdit} />
        ))}
      </ul>
      {canEdit && (
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(event) => {
            event.preventDefault();
            if (itemId) add.mutate({ tripId, itemId }, { onSuccess: () => setItemId('') });
          }}
        >
          <label className="flex flex-col gap-1.5 text-sm font-medium text-scree-900">
            Add a device from your locker
            <select
              value={itemId}
              onChange={(event) => setItemId(event.target.value)}
              className="min-h-11 rounded-lg border-2 border-scree-300 bg-white px-3 text-base font-normal"
            >
              <option value="">{locker.isPending ? 'Loading…' : 'Choose a device'}</option>
              {choices.map((item) => (
                <option key={item.id} value={item.id}>
                  {item.name}
                </option>
              ))}
            </select>
          </label>
          <Button type="submit" disabled={!itemId || add.isPending}>
            Add device
          </Button>
          {add.isError && <p className="w-full text-sm text-rosehip-700">{add.error.message}</p>}
        </form>
      )}
    </section>
  );
}
