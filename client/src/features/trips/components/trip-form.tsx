import { skyPresets, tripInputSchema, type GpxRoute, type Trip } from '@gramwatt/shared';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { isApiError } from '@/lib/api-client';
import { useSaveTrip } from '../api/save-trip';
import {
  mapTripErrors,
  tripFormToBody,
  tripFormValues,
  type TripFormField,
  type TripFormValues,
} from '../utils/trip-form-values';
import { GpxRouteSummary, GpxUpload } from './gpx-upload';

export interface TripFormProps {
  /** The trip to edit; absent for a new trip. */
  trip?: Trip;
  onSaved: (trip: Trip) => void;
  onCancel: () => void;
}

const skyFieldHelp: { field: TripFormField; label: string; hint: string }[] = [
  { field: 'clearPct', label: 'Clear days', hint: 'Of all days, how many are clear, in the long run.' },
  {
    field: 'persistencePct',
    label: 'Cloud that stays',
    hint: 'After a cloudy day, the chance that the next day is cloudy too. Higher means longer grey spells.',
  },
  {
    field: 'transmissionPct',
    label: 'Light on a cloudy day',
    hint: 'How much of a clear day’s sunlight a cloudy day still lets through.',
  },
  { field: 'shadePct', label: 'Shade from trees or terrain', hint: 'How much light the canopy or slopes block.' },
  {
    field: 'likelihoodPct',
    label: 'Planning confidence',
    hint: 'How sure you want to be that the longest cloudy spell is no worse than the one planned for.',
  },
];

/** Create or edit a trip: place (or a GPX file), dates, windows, sky, temperatures, reserve and gram limit. */
export function TripForm({ trip, onSaved, onCancel }: TripFormProps) {
  const form = useForm<TripFormValues>({ defaultValues: tripFormValues(trip) });
  const { register, handleSubmit, setValue, watch, formState } = form;
  const save = useSaveTrip();
  const [errors, setErrors] = useState<ReturnType<typeof mapTripErrors>>({ fields: {}, other: [] });
  const [gpx, setGpx] = useState<{ route: GpxRoute; text: string } | null>(null);
  const [keptBearings] = useState<number[] | null>(trip?.walkingBearingsDeg ?? null);
  const sky = watch('sky');
  const nights = Number(watch('nights'));

  const bearings = (): number[] | null => {
    if (gpx) return gpx.route.walkingBearingsDeg;
    // Bearings kept from before fit only while the trip keeps its length (or one bearing for every day).
    if (keptBearings && (keptBearings.length === 1 || keptBearings.length === nights + 1)) return keptBearings;
    return null;
  };

  const onRoute = (route: GpxRoute, text: string) => {
    setGpx({ route, text });
    setValue('latitudeDeg', String(Math.round(route.start.latDeg * 1e5) / 1e5));
    setValue('longitudeDeg', String(Math.round(route.start.lonDeg * 1e5) / 1e5));
  };

  const onSubmit = handleSubmit(async (values) => {
    const body = tripFormToBody(values, bearings(), trip);
    const checked = tripInputSchema.safeParse(body);
    if (!checked.success) {
      setErrors(
        mapTripErrors(checked.error.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message }))),
      );
      return;
    }
    setErrors({ fields: {}, other: [] });
    try {
      onSaved(await save.mutateAsync({ tripId: trip?.id, body }));
    } catch (error) {
      if (isApiError(error, 400)) setErrors(mapTripErrors(error.errors));
      else setErrors({ fields: {}, other: [error instanceof Error ? error.message : 'Saving failed.'] });
    }
  });

  const field = (name: TripFormField) => ({ ...register(name), error: errors.fields[name] });
  const hasErrors = Object.keys(errors.fields).length > 0 || errors.other.length > 0;

  return (
    <form onSubmit={onSubmit} noValidate className="flex max-w-3xl flex-col gap-8">
      {hasErrors && (
        <Alert tone="error" title="Some fields need a look">
          {errors.other.length > 0 ? errors.other.join(' ') : 'The problems are shown beside each field.'}
        </Alert>
      )}
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-semibold text-scree-900">Trip</legend>
        <TextField label="Name" required className="sm:col-span-2" {...field('name')} />
        <TextField label="Start date" type="date" required {...field('startDate')} />
        <TextField
          label="Nights"
          unit="nights"
          inputMode="numeric"
          hint={Number.isFinite(nights) && nights > 0 ? `${nights + 1} trip days` : undefined}
          required
          {...field('nights')}
        />
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-semibold text-scree-900">Place</legend>
        <p className="text-sm text-scree-700 sm:col-span-2">
          Give the start point, or read it from a GPX file of your route. The time zone follows from the place.
        </p>
        <TextField label="Latitude" unit="°" inputMode="decimal" hint="North positive" {...field('latitudeDeg')} />
        <TextField label="Longitude" unit="°" inputMode="decimal" hint="East positive" {...field('longitudeDeg')} />
        <div className="sm:col-span-2">
          <GpxUpload nights={nights} onRoute={onRoute} serverError={errors.fields.gpx} />
        </div>
        {gpx && (
          <div className="sm:col-span-2">
            <GpxRouteSummary route={gpx.route} />
          </div>
        )}
        {!gpx && keptBearings && (
          <p className="text-sm text-scree-700 sm:col-span-2">
            Walking bearings kept from before: {keptBearings.map((b) => `${Math.round(b)}°`).join(', ')}.
          </p>
        )}
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-semibold text-scree-900">Your day</legend>
        <TextField label="Walking starts" type="time" unit="local" {...field('walkStart')} />
        <TextField label="Walking ends" type="time" unit="local" {...field('walkEnd')} />
        <TextField label="Camp starts" type="time" unit="local" {...field('campStart')} />
        <TextField label="Camp ends" type="time" unit="local" {...field('campEnd')} />
        <TextField
          label="Re-aim the panel at camp every"
          unit="h"
          inputMode="decimal"
          hint="How often you turn the propped panel to face the sun."
          {...field('reaimEveryH')}
        />
      </fieldset>

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-2 text-lg font-semibold text-scree-900">Sky</legend>
        <div className="grid gap-2 sm:grid-cols-2" role="radiogroup" aria-label="Sky">
          {skyPresets.map((preset) => (
            <label
              key={preset.id}
              className="flex gap-2 rounded-lg border-2 border-scree-200 bg-white p-3 has-[:checked]:border-tarn-600"
            >
              <input type="radio" value={preset.id} {...register('sky')} className="mt-1" />
              <span>
                <span className="font-medium text-scree-900">{preset.label}</span>
                <span className="block text-sm text-scree-700">{preset.description}</span>
              </span>
            </label>
          ))}
          <label className="flex gap-2 rounded-lg border-2 border-scree-200 bg-white p-3 has-[:checked]:border-tarn-600">
            <input type="radio" value="custom" {...register('sky')} className="mt-1" />
            <span>
              <span className="font-medium text-scree-900">My own values</span>
              <span className="block text-sm text-scree-700">Set the sky yourself, for a place you know.</span>
            </span>
          </label>
        </div>
        {errors.fields.sky && <p className="text-sm font-medium text-rosehip-700">{errors.fields.sky}</p>}
        {sky === 'custom' && (
          <div className="grid gap-4 sm:grid-cols-2">
            {skyFieldHelp.map(({ field: name, label, hint }) => (
              <TextField key={name} label={label} unit="%" inputMode="decimal" hint={hint} {...field(name)} />
            ))}
          </div>
        )}
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-semibold text-scree-900">Temperatures, reserve and grams</legend>
        <TextField label="Daily low" unit="°C" inputMode="decimal" {...field('lowC')} />
        <TextField
          label="Daily high"
          unit="°C"
          inputMode="decimal"
          hint="Lithium cells must not be charged below 0 °C."
          {...field('highC')}
        />
        <TextField
          label="Reserve"
          unit="%"
          inputMode="decimal"
          hint="The share of stored energy you never want to go below."
          {...field('reservePct')}
        />
        <TextField
          label="Gram limit for power gear"
          unit="g"
          inputMode="numeric"
          hint="Leave empty for no limit."
          {...field('gramLimitG')}
        />
        <label className="flex flex-col gap-1.5 text-sm font-medium text-scree-900 sm:col-span-2">
          Notes
          <textarea
            rows={3}
            className="rounded-lg border-2 border-scree-300 p-3 text-base font-normal focus:border-tarn-600 focus:outline-none"
            {...register('notes')}
          />
          {errors.fields.notes && <span className="text-rosehip-700">{errors.fields.notes}</span>}
        </label>
      </fieldset>

      <div className="flex flex-wrap gap-3">
        <Button type="submit" disabled={formState.isSubmitting}>
          {trip ? 'Save trip' : 'Create trip'}
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
