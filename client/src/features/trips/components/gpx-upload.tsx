import { deriveGpxRoute, gpxSizeError, type GpxRoute, type WalkingDay } from '@gramwatt/shared';
import { useId, useState } from 'react';

/** A file's text; FileReader where `Blob.text()` is missing (older browsers, jsdom). */
const readText = (file: File): Promise<string> =>
  typeof file.text === 'function'
    ? file.text()
    : new Promise((resolve, reject) => {
        const reader = new FileReader();
        reader.onload = () => resolve(String(reader.result));
        reader.onerror = () => reject(reader.error ?? new Error('The file could not be read.'));
        reader.readAsText(file);
      });

export interface GpxUploadProps {
  nights: number;
  /** Called with the route read from a good file; a bad file leaves the trip as it was. */
  onRoute: (route: GpxRoute, text: string) => void;
  /** A problem the server found with the bearings the file gave. */
  serverError?: string;
}

/** Reads a GPX route or track in the browser to fill the start point and each day's bearing and distance. */
export function GpxUpload({ nights, onRoute, serverError }: GpxUploadProps) {
  const id = useId();
  const [error, setError] = useState<string | null>(null);

  const read = async (file: File | undefined) => {
    if (!file) return;
    const tooLarge = gpxSizeError(file.size);
    if (tooLarge) {
      setError(tooLarge.message);
      return;
    }
    let text: string;
    try {
      text = await readText(file);
    } catch {
      setError('The file could not be read.');
      return;
    }
    const result = deriveGpxRoute(text, Number.isInteger(nights) && nights > 0 ? nights : 1);
    if (!result.ok) {
      setError(result.error.message);
      return;
    }
    setError(null);
    onRoute(result.route, text);
  };

  const message = error ?? serverError;
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="text-sm font-medium text-scree-900">
        GPX route or track (optional)
      </label>
      <input
        id={id}
        type="file"
        accept=".gpx,application/gpx+xml,application/xml,text/xml"
        aria-describedby={message ? `${id}-error` : `${id}-hint`}
        aria-invalid={message ? true : undefined}
        className="text-sm text-scree-800 file:mr-3 file:min-h-11 file:rounded-lg file:border-2 file:border-scree-300 file:bg-firn-100 file:px-3 file:font-medium"
        onChange={(event) => void read(event.target.files?.[0])}
      />
      {message ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-medium text-rosehip-700">
          {message} The trip is unchanged.
        </p>
      ) : (
        <p id={`${id}-hint`} className="text-sm text-scree-600">
          Fills the start point and the direction you walk each day (the panel on your pack faces behind you).
        </p>
      )}
    </div>
  );
}

/** The days read from a GPX file, as a short table. */
export function GpxRouteSummary({ route }: { route: GpxRoute }) {
  return (
    <div className="rounded-lg border-2 border-scree-200 bg-firn-50 p-3 text-sm text-scree-800">
      <p>
        {route.name ? `“${route.name}”: ` : ''}
        {route.pointCount} points, {(route.totalDistanceM / 1000).toFixed(1)} km, starting at{' '}
        {route.start.latDeg.toFixed(4)}°, {route.start.lonDeg.toFixed(4)}°.
        {route.splitNote ? ` ${route.splitNote}` : ''}
      </p>
      <table className="mt-2 w-full text-left [&_td]:py-0.5 [&_td]:pr-3 [&_th]:pb-1 [&_th]:pr-3 [&_th]:align-bottom">
        <caption className="sr-only">Walking days from the GPX file</caption>
        <thead>
          <tr>
            <th scope="col">Day</th>
            <th scope="col">Distance (km)</th>
            <th scope="col">Walking bearing (° from north)</th>
          </tr>
        </thead>
        <tbody>
          {route.days.map((day: WalkingDay, index: number) => (
            <tr key={index}>
              <td>{index + 1}</td>
              <td>{(day.distanceM / 1000).toFixed(1)}</td>
              <td>{day.bearingDeg === null ? 'no movement' : Math.round(day.bearingDeg)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
