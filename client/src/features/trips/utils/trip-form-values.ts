import {
  defaultDailyHighC,
  defaultDailyLowC,
  defaultReserveShare,
  defaultSkyPresetId,
  skyPresets,
  type ApiFieldError,
  type Trip,
  type TripInputDraft,
} from '@gramwatt/shared';

/** Sky choice on screen: one of the presets, or the member's own values. */
export type SkyChoice = 'open-sky' | 'mixed' | 'socked-in' | 'custom';

/** The trip form's fields as typed (text inputs); shares are percent. */
export interface TripFormValues {
  name: string;
  startDate: string;
  nights: string;
  latitudeDeg: string;
  longitudeDeg: string;
  walkStart: string;
  walkEnd: string;
  campStart: string;
  campEnd: string;
  reaimEveryH: string;
  sky: SkyChoice;
  clearPct: string;
  persistencePct: string;
  transmissionPct: string;
  shadePct: string;
  likelihoodPct: string;
  lowC: string;
  highC: string;
  reservePct: string;
  gramLimitG: string;
  notes: string;
}
export type TripFormField = keyof TripFormValues;

const pct = (share: number): string => String(Math.round(share * 1000) / 10);
const presetValues = (id: string) => skyPresets.find((p) => p.id === id)?.values ?? skyPresets[0]!.values;
const firstNumber = (value: number | number[]): number => (Array.isArray(value) ? (value[0] ?? 0) : value);

/** Form values for a new trip (the shared defaults) or for editing `trip`. */
export function tripFormValues(trip?: Trip): TripFormValues {
  const skyChoice: SkyChoice = trip ? (trip.skyPresetId ?? 'custom') : defaultSkyPresetId;
  const sky = trip?.sky ?? presetValues(defaultSkyPresetId);
  return {
    name: trip?.name ?? '',
    startDate: trip?.startDate ?? '',
    nights: String(trip?.nights ?? 3),
    latitudeDeg: trip ? String(trip.latitudeDeg) : '',
    longitudeDeg: trip ? String(trip.longitudeDeg) : '',
    walkStart: trip?.walkWindow.start ?? '08:00',
    walkEnd: trip?.walkWindow.end ?? '16:00',
    campStart: trip?.campWindow.start ?? '16:00',
    campEnd: trip?.campWindow.end ?? '08:00',
    reaimEveryH: String(trip?.reaimEveryH ?? 2),
    sky: skyChoice,
    clearPct: pct(sky.clearShare),
    persistencePct: pct(sky.cloudyPersistence),
    transmissionPct: pct(sky.cloudyTransmission),
    shadePct: pct(sky.canopyShade),
    likelihoodPct: pct(sky.designLikelihood),
    lowC: String(trip ? firstNumber(trip.temperatures.lowC) : defaultDailyLowC),
    highC: String(trip ? firstNumber(trip.temperatures.highC) : defaultDailyHighC),
    reservePct: pct(trip?.reserveShare ?? defaultReserveShare),
    gramLimitG: trip?.gramLimitG == null ? '' : String(trip.gramLimitG),
    notes: trip?.notes ?? '',
  };
}

/** A typed number, or undefined for an empty box (the schema then says the field is required). */
const num = (text: string): number | undefined => (text.trim() === '' ? undefined : Number(text.replace(',', '.')));
const share = (text: string): number | undefined => {
  const n = num(text);
  return n === undefined ? undefined : n / 100;
};

/**
 * The API body for the form. `base` is the trip being edited: PUT replaces the whole trip, so the fields
 * this form does not show (carry, step, elevation…) are sent back as they are.
 */
export function tripFormToBody(
  values: TripFormValues,
  walkingBearingsDeg: number[] | null,
  base?: Trip,
): TripInputDraft {
  const kept = base
    ? {
        carry: base.carry,
        groundAlbedo: base.groundAlbedo,
        stepMinutes: base.stepMinutes,
        elevationM: base.elevationM,
        linkeTurbidity: base.linkeTurbidity,
        ...(base.timeZoneDerived ? {} : { timeZone: base.timeZone }),
      }
    : {};
  const custom = values.sky === 'custom';
  return {
    ...kept,
    name: values.name,
    notes: values.notes,
    startDate: values.startDate,
    nights: num(values.nights) as number,
    latitudeDeg: num(values.latitudeDeg) as number,
    longitudeDeg: num(values.longitudeDeg) as number,
    walkWindow: { start: values.walkStart, end: values.walkEnd },
    campWindow: { start: values.campStart, end: values.campEnd },
    walkingBearingsDeg,
    reaimEveryH: num(values.reaimEveryH) as number,
    skyPresetId: values.sky === 'custom' ? null : values.sky,
    ...(custom
      ? {
          sky: {
            clearShare: share(values.clearPct) as number,
            cloudyPersistence: share(values.persistencePct) as number,
            cloudyTransmission: share(values.transmissionPct) as number,
            canopyShade: share(values.shadePct) as number,
            designLikelihood: share(values.likelihoodPct) as number,
          },
        }
      : {}),
    temperatures: { lowC: num(values.lowC) as number, highC: num(values.highC) as number },
    reserveShare: share(values.reservePct) as number,
    gramLimitG: values.gramLimitG.trim() === '' ? null : (num(values.gramLimitG) as number),
  };
}

/** Where an API field path shows on the form; `gpx` is the upload (the bearings come from it). */
const fieldByPath: Record<string, TripFormField | 'gpx'> = {
  name: 'name',
  notes: 'notes',
  startDate: 'startDate',
  nights: 'nights',
  latitudeDeg: 'latitudeDeg',
  longitudeDeg: 'longitudeDeg',
  'walkWindow.start': 'walkStart',
  'walkWindow.end': 'walkEnd',
  walkWindow: 'walkEnd',
  'campWindow.start': 'campStart',
  'campWindow.end': 'campEnd',
  campWindow: 'campEnd',
  reaimEveryH: 'reaimEveryH',
  sky: 'sky',
  skyPresetId: 'sky',
  'sky.clearShare': 'clearPct',
  'sky.cloudyPersistence': 'persistencePct',
  'sky.cloudyTransmission': 'transmissionPct',
  'sky.canopyShade': 'shadePct',
  'sky.designLikelihood': 'likelihoodPct',
  temperatures: 'highC',
  'temperatures.lowC': 'lowC',
  'temperatures.highC': 'highC',
  reserveShare: 'reservePct',
  gramLimitG: 'gramLimitG',
  walkingBearingsDeg: 'gpx',
  timeZone: 'latitudeDeg',
};

const percentFields = new Set<string>(['clearPct', 'persistencePct', 'transmissionPct', 'shadePct', 'likelihoodPct']);

/** Shares are 0–1 in the API and percent here: say a share's range and minimum in percent. */
function onScreenMessage(field: string, message: string): string {
  if (field === 'reservePct' && /between|at least|below/.test(message)) return 'Reserve must be from 0 to below 100 %';
  if (!percentFields.has(field)) return message;
  const atLeast = /at least ([0-9.]+)/.exec(message);
  if (atLeast) return message.replace(atLeast[0], `at least ${pct(Number(atLeast[1]))} %`);
  return message.replace(/between 0 to 1/, 'between 0 and 100 %');
}

export interface MappedErrors {
  fields: Partial<Record<TripFormField | 'gpx', string>>;
  /** Problems with no field on this form. */
  other: string[];
}

/** Sorts an API 400's field errors (or the shared schema's issues) onto the form's fields. */
export function mapTripErrors(errors: readonly ApiFieldError[]): MappedErrors {
  const result: MappedErrors = { fields: {}, other: [] };
  for (const { path, message } of errors) {
    const field = fieldByPath[path] ?? fieldByPath[path.split('.').slice(0, 2).join('.')];
    if (!field) {
      result.other.push(message);
      continue;
    }
    result.fields[field] ??= onScreenMessage(field, message);
  }
  return result;
}
