/** An SVG hatch to use as `fill="url(#id)"` inside a chart: the dry days' pattern, and the demand bars'. */
export function HatchPattern({
  id,
  colour,
  background = 'transparent',
}: {
  id: string;
  colour: string;
  background?: string;
}) {
  return (
    <pattern id={id} width="7" height="7" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
      <rect width="7" height="7" fill={background} />
      <line x1="0" y1="0" x2="0" y2="7" stroke={colour} strokeWidth="3" />
    </pattern>
  );
}
