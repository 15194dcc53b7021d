import type { ChainContext, ChannelContext } from "./chain-context";
import { combIntegral } from "./comb";
import { type Interval, absInterval, hull, intersect, strictlyInside, unionLength } from "./intervals";
import { lorentzianIntegral, lorentzianProductIntegral, lorentzianSquaredIntegral } from "./lorentz";

/** The IF image of one optical band: `{ |L − x| : x ∈ X }`, with `e = +1` when the band lies above L. */
export interface BandImage {
  /** The optical band X. */
  optical: Interval;
  /** Its IF image. */
  image: Interval;
  /** +1 when X lies above L (x = L + y), −1 when below (x = L − y). */
  e: 1 | -1;
}

/** IF geometry of a channel at LO offset L (GHz). */
export interface SlotGeometry {
  images: BandImage[];
  /** Hull of the band images. */
  slot: Interval;
  /** `O = [slot.lo − D, slot.hi + D]`. */
  occupied: Interval;
}

/** The optical band that L lies strictly inside, or null (docs/plan-format.md §3.2 "Per channel": `lo-in-band`). */
export function bandHoldingLo(ch: ChannelContext, L: number): Interval | null {
  for (const x of ch.optical) if (strictlyInside(L, x)) return x;
  return null;
}

/**
 * IF slot and occupied band of a channel at L; null when the LO lies
 * strictly inside one of its optical bands (no slot).
 */
export function slotAt(ch: ChannelContext, L: number, D: number): SlotGeometry | null {
  const images: BandImage[] = [];
  for (const x of ch.optical) {
    if (strictlyInside(L, x)) return null;
    if (L <= x[0]) images.push({ optical: x, image: [x[0] - L, x[1] - L], e: 1 });
    else images.push({ optical: x, image: [L - x[1], L - x[0]], e: -1 });
  }
  const slot = hull(images.map((b) => b.image));
  return { images, slot, occupied: [slot[0] - D, slot[1] + D] };
}

/** Sensitivity figures of a channel at L (docs/plan-format.md §3.2 "Per channel", Sensitivity). */
export interface Sensitivity {
  /** ∫W dy, ∫W² dy and the length of the union of the band images, in GHz. */
  intW: number;
  intW2: number;
  unionGHz: number;
  /** ∫S dy in K·Hz and ∫S² dy in K²·Hz. */
  intS: number;
  intS2: number;
  nedtK: number;
  /** `(∫S)²/∫S²` in MHz; null when S ≡ 0. */
  radiometricBandwidthMHz: number | null;
}

/**
 * `S(y) = antennaK·W(y) + receiverK` (the channel's, or its computed budget's total) over the union of the band images;
 * `NEΔT = sqrt(∫S²/τ + (ΔG/G)²(∫S)²)/∫W`, integrals in hertz. The DSB cross
 * term `2∫M(x₁(y))M(x₂(y))dy` over the overlap of the two images is added
 * in closed form.
 */
export function sensitivityAt(ctx: ChainContext, ch: ChannelContext, geo: SlotGeometry, L: number): Sensitivity {
  return receivedSensitivity(ctx, ch, geo, L, 0, 0);
}

/**
 * The sensitivity figures of a channel whose received optical bands are
 * its bands widened by `w` on each side and moved by `d` against the wanted
 * mode, with the IF range the band images at L widened by `w`
 * (docs/plan-format.md §12.3 "Received band"): the envelope's figures at a
 * detuning d, for the slot filter (w = 0) or the occupied-band filter
 * (w = D). With d = 0 and w = 0 this is the nominal figure, computed with
 * the same arithmetic.
 */
export function receivedSensitivity(
  ctx: ChainContext,
  ch: ChannelContext,
  geo: SlotGeometry,
  L: number,
  d: number,
  w: number,
): Sensitivity {
  let intW = ch.intW;
  let intW2 = ch.intW2Self;
  if (d !== 0 || w !== 0) {
    intW = 0;
    intW2 = 0;
    for (const x of ch.optical) {
      intW += lorentzianIntegral(x[0] - w + d, x[1] + w + d, ctx.modeCentre, ctx.delta);
      intW2 += lorentzianSquaredIntegral(x[0] - w + d, x[1] + w + d, ctx.modeCentre, ctx.delta);
    }
  }
  let unionGHz: number;
  const only = geo.images.length === 1 ? (geo.images[0] as BandImage).image : null;
  if (only) {
    // one band (SSB): no cross term, and the union is the image itself
    unionGHz = w === 0 ? only[1] - only[0] : only[1] + w - (only[0] - w);
  } else {
    const images: Interval[] =
      w === 0 ? geo.images.map((b) => b.image) : geo.images.map((b) => [b.image[0] - w, b.image[1] + w] as const);
    const hw = ctx.delta / 2;
    for (let i = 0; i < geo.images.length; i++) {
      for (let j = i + 1; j < geo.images.length; j++) {
        const bi = geo.images[i] as BandImage;
        const bj = geo.images[j] as BandImage;
        const ov = intersect(images[i] as Interval, images[j] as Interval);
        if (ov && ov[1] > ov[0]) {
          const pi = bi.e * (ctx.modeCentre - (d === 0 ? L : L + d));
          const pj = bj.e * (ctx.modeCentre - (d === 0 ? L : L + d));
          intW2 += 2 * lorentzianProductIntegral(ov[0], ov[1], pi, pj, hw);
        }
      }
    }
    unionGHz = unionLength(images);
  }
  const Hz = 1e9;
  const { antennaK: Ta, gainStability: g, integrationMs } = ch.channel;
  const Tr = ch.receiverK;
  const intS = (Ta * intW + Tr * unionGHz) * Hz;
  const intS2 = (Ta * Ta * intW2 + 2 * Ta * Tr * intW + Tr * Tr * unionGHz) * Hz;
  const tau = integrationMs / 1000;
  const nedtK = Math.sqrt(intS2 / tau + g * g * intS * intS) / (intW * Hz);
  const radiometricBandwidthMHz = intS2 > 0 ? (intS * intS) / intS2 / 1e6 : null;
  return { intW, intW2, unionGHz, intS, intS2, nedtK, radiometricBandwidthMHz };
}

/** Image band of an SSB channel at L (docs/plan-format.md §3.2 "Per channel", Image). */
export interface ImageFigures {
  /** Optical image band `X' = 2L − X`. */
  opticalImage: Interval;
  /** `|X'|` as reported in `imageGHz`. */
  imageGHz: Interval;
  /** `∫Wᵢ dy` in GHz. */
  intWi: number;
  /** `10·log10(∫W/∫Wᵢ)`; null when `∫Wᵢ = 0`. */
  rejectionDB: number | null;
}

/**
 * `∫Wᵢ dy = ∫_{X'} A(|x'|)·C(x') dx'`: the comb integrated in closed form
 * over the parts of X' whose magnitude lies in `rfInput`.
 */
export function imageAt(ctx: ChainContext, ch: ChannelContext, L: number): ImageFigures | null {
  if (ch.dsb) return null;
  const x = ch.optical[0];
  if (!x) return null;
  const opticalImage: Interval = [2 * L - x[1], 2 * L - x[0]];
  let intWi = 0;
  const [rlo, rhi] = ctx.rfInput;
  for (const window of [
    [rlo, rhi],
    [-rhi, -rlo],
  ] as Interval[]) {
    const part = intersect(opticalImage, window);
    if (part && part[1] > part[0]) intWi += combIntegral(part[0], part[1], ctx.comb);
  }
  const rejectionDB = intWi > 0 ? 10 * Math.log10(ch.intW / intWi) : null;
  return { opticalImage, imageGHz: absInterval(opticalImage), intWi, rejectionDB };
}
