import type { ItemKind } from "@/lib/lanes";
import { SPUR_FAMILIES } from "@/lib/plan";
import { FAMILY_LOOK, KIND_LOOK, SEVERITY_COLOUR, markerPath, orderShape } from "./vocabulary";

const GROUPS: { title: string; kinds: ItemKind[] }[] = [
  {
    title: "RF",
    kinds: [
      "channel-band",
      "envelope-band",
      "image-band",
      "mode-passband",
      "mode-drift",
      "rf-input",
      "protected-band",
      "line-centre",
    ],
  },
  { title: "Optical offset", kinds: ["reach", "feasible", "blocked", "carrier", "lock-sideband", "sideband", "lo"] },
  { title: "IF", kinds: ["detector-band", "if-slot", "occupied", "guard", "nyquist-edge"] },
];

function Swatch({ kind }: { kind: ItemKind }) {
  const look = KIND_LOOK[kind];
  const line =
    kind === "line-centre" ||
    kind === "nyquist-edge" ||
    kind === "carrier" ||
    kind === "lock-sideband" ||
    kind === "lo";
  return (
    <svg width={22} height={12} aria-hidden="true">
      {line ? (
        <line
          x1={11}
          x2={11}
          y1={0}
          y2={12}
          stroke={kind === "lo" ? look.fill : look.stroke}
          strokeWidth={2}
          strokeDasharray={look.dash}
        />
      ) : (
        <rect
          x={1}
          y={1}
          width={20}
          height={10}
          rx={2}
          fill={look.fill}
          stroke={look.stroke === "none" ? "#ccc" : look.stroke}
          strokeDasharray={look.dash}
        />
      )}
    </svg>
  );
}

/** What every mark of the lane view means. */
export function Legend() {
  const families = SPUR_FAMILIES.map((f) => [f, FAMILY_LOOK[f]] as const);
  return (
    <div className="grid gap-3 text-xs text-ink sm:grid-cols-2 lg:grid-cols-4" aria-label="Legend">
      {GROUPS.map((g) => (
        <div key={g.title}>
          <div className="mb-1 font-semibold">{g.title}</div>
          <ul className="space-y-0.5">
            {g.kinds.map((k) => (
              <li key={k} className="flex items-center gap-2">
                <Swatch kind={k} /> {KIND_LOOK[k].name}
              </li>
            ))}
          </ul>
        </div>
      ))}
      <div>
        <div className="mb-1 font-semibold">Spurs: family (colour, fill) and order (shape)</div>
        <ul className="space-y-0.5">
          {families.map(([f, look]) => (
            <li key={f} className="flex items-center gap-2">
              <svg width={22} height={12} aria-hidden="true">
                <rect x={1} y={1} width={20} height={10} fill={`url(#${look.pattern})`} stroke={look.colour} />
              </svg>
              {look.name}
            </li>
          ))}
        </ul>
        <div className="mt-1 flex flex-wrap items-center gap-2">
          {[1, 2, 3, 4, 5].map((o) => (
            <span key={o} className="flex items-center gap-1">
              <svg width={12} height={12} aria-hidden="true">
                <path d={markerPath(orderShape(o), 4)} transform="translate(6,6)" fill="#555" stroke="#555" />
              </svg>
              {o === 5 ? "5+" : o}
            </span>
          ))}
        </div>
        <div className="mt-1">
          Outline: <span style={{ color: SEVERITY_COLOUR.error }}>error</span> ·{" "}
          <span style={{ color: SEVERITY_COLOUR.warning }}>warning</span> ·{" "}
          <span style={{ color: SEVERITY_COLOUR.info }}>info</span>; a filled spur marker hits a slot.
        </div>
      </div>
    </div>
  );
}
