import { useId, type ReactNode } from 'react';

export interface LegendEntry {
  label: string;
  /** A small drawing of the series' mark (line style or fill), hidden from screen readers. */
  swatch: ReactNode;
}

export interface ChartFigureProps {
  title: string;
  /** What the chart shows in one or two sentences, read by screen readers in place of the drawing. */
  summary: string;
  legend: readonly LegendEntry[];
  children: ReactNode;
}

/** A chart as a figure: a heading, the drawing (hidden from screen readers), its summary and its legend in words. */
export function ChartFigure({ title, summary, legend, children }: ChartFigureProps) {
  const headingId = useId();
  const summaryId = useId();
  return (
    <figure
      aria-labelledby={headingId}
      aria-describedby={summaryId}
      className="flex min-w-0 flex-col gap-2 rounded-xl bg-white p-4 shadow-card"
    >
      <h3 id={headingId} className="font-semibold text-scree-950">
        {title}
      </h3>
      <div aria-hidden="true" className="h-56 w-full min-w-0 sm:h-64">
        {children}
      </div>
      <ul className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-scree-800">
        {legend.map((entry) => (
          <li key={entry.label} className="flex items-center gap-1.5">
            <span aria-hidden="true">{entry.swatch}</span>
            {entry.label}
          </li>
        ))}
      </ul>
      <figcaption id={summaryId} className="text-sm text-scree-700">
        {summary}
      </figcaption>
    </figure>
  );
}

/** A line swatch for a legend: solid, or dashed like its series. */
export function LineSwatch({ colour, dashed = false }: { colour: string; dashed?: boolean }) {
  return (
    <svg viewBox="0 0 24 8" className="h-2 w-6">
      <path d="M1 4h22" stroke={colour} strokeWidth="3" strokeDasharray={dashed ? '5 3' : undefined} />
    </svg>
  );
}

/** A fill swatch for a legend: solid, outlined or hatched like its bars. */
export function FillSwatch({
  colour,
  hatched = false,
  outlined = false,
}: {
  colour: string;
  hatched?: boolean;
  outlined?: boolean;
}) {
  return (
    <svg viewBox="0 0 12 12" className="size-3">
      <rect
        x="1"
        y="1"
        width="10"
        height="10"
        fill={hatched || outlined ? 'white' : colour}
        stroke={colour}
        strokeWidth={outlined ? 2 : 1}
      />
      {hatched && <path d="M-1 5 5-1M-1 11 11-1M5 13 13 5" stroke={colour} strokeWidth="1.5" />}
    </svg>
  );
}
