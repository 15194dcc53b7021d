import { FAMILY_LOOK } from "../vocabulary";

/** The chart's fill patterns (protected and blocked bands, one per spur family) and the clip of the plot area. */
export function ChartDefs({ inner, height }: { inner: number; height: number }) {
  return (
    <defs>
      <pattern id="hl-pat-protected" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <rect width="6" height="6" fill="#f2f6f7" />
        <line x1="0" y1="0" x2="0" y2="6" stroke="#c5d3d8" strokeWidth="2" />
      </pattern>
      <pattern id="hl-pat-blocked" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(-45)">
        <rect width="6" height="6" fill="#f8e1df" />
        <line x1="0" y1="0" x2="0" y2="6" stroke="#d98c86" strokeWidth="2" />
      </pattern>
      <pattern id="hl-pat-cross" width="5" height="5" patternUnits="userSpaceOnUse">
        <path d="M0 0 L5 5 M5 0 L0 5" stroke={FAMILY_LOOK["carrier-beat"].colour} strokeWidth="0.8" />
      </pattern>
      <pattern id="hl-pat-diag" width="5" height="5" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <line x1="0" y1="0" x2="0" y2="5" stroke={FAMILY_LOOK["lock-lo"].colour} strokeWidth="1.2" />
      </pattern>
      <pattern id="hl-pat-vert" width="4" height="4" patternUnits="userSpaceOnUse">
        <line x1="1" y1="0" x2="1" y2="4" stroke={FAMILY_LOOK["lock-self"].colour} strokeWidth="1" />
      </pattern>
      <pattern id="hl-pat-dots" width="4" height="4" patternUnits="userSpaceOnUse">
        <circle cx="2" cy="2" r="0.9" fill={FAMILY_LOOK.harmonic.colour} />
      </pattern>
      <pattern id="hl-pat-horiz" width="4" height="4" patternUnits="userSpaceOnUse">
        <line x1="0" y1="2" x2="4" y2="2" stroke={FAMILY_LOOK.intermod.colour} strokeWidth="0.9" />
      </pattern>
      <clipPath id="hl-clip">
        <rect x={-1} y={0} width={inner + 2} height={height} />
      </clipPath>
    </defs>
  );
}
