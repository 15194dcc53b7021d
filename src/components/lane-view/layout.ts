import type { Lane, LaneModel } from "@/lib/lanes";

/** Vertical layout of the chart (pixels). */
export const MARGIN_LEFT = 168;
export const MARGIN_RIGHT = 40;
export const AXIS_H = 30;
export const LANE_GAP = 12;
const ROW_H: Record<Lane["kind"], number> = { rf: 16, optical: 15, if: 11 };
const PAD = 6;

export interface LaneBox {
  lane: Lane;
  y: number;
  h: number;
  rowH: number;
}

export interface ChartLayout {
  ghzAxisY: number;
  ifAxisY: number;
  boxes: LaneBox[];
  height: number;
  /** y range of the GHz section and of the IF section (for wheel zoom). */
  ghzSection: [number, number];
  ifSection: [number, number];
}

export function chartLayout(model: LaneModel): ChartLayout {
  let y = AXIS_H;
  const boxes: LaneBox[] = [];
  const ghz = model.lanes.filter((l) => l.axis === "ghz");
  const ifl = model.lanes.filter((l) => l.axis === "if");
  for (const lane of ghz) {
    const rowH = ROW_H[lane.kind];
    const h = lane.rows * rowH + 2 * PAD;
    boxes.push({ lane, y, h, rowH });
    y += h + LANE_GAP;
  }
  const ghzEnd = y;
  const ifAxisY = y + 8;
  y = ifAxisY + AXIS_H;
  for (const lane of ifl) {
    const rowH = ROW_H[lane.kind];
    const h = lane.rows * rowH + 2 * PAD;
    boxes.push({ lane, y, h, rowH });
    y += h + LANE_GAP;
  }
  return {
    ghzAxisY: AXIS_H,
    ifAxisY: ifAxisY + AXIS_H,
    boxes,
    height: y + 4,
    ghzSection: [0, ghzEnd],
    ifSection: [ghzEnd, y],
  };
}

export const ROW_PAD = PAD;
