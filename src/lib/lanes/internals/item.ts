import type { GHzPair, LaneItem, Severity, SpurFamily } from "../types";

type Mutable<T> = { -readonly [K in keyof T]: T[K] };

/** What an item is made from: the required fields, any optional ones, and its facts as a function. */
export type ItemInput = Omit<Partial<Mutable<LaneItem>>, "facts"> &
  Pick<LaneItem, "id" | "lane" | "kind" | "row" | "lo" | "hi" | "label"> & { facts?: () => [string, string][] };

/**
 * One item. Its facts (formatted numbers) are only worked out when first
 * read — tooltips, details and the table read a few items, while a live
 * re-check rebuilds thousands of them on every frame. A class keeps every
 * item on one object shape.
 */
class Item implements LaneItem {
  readonly id: string;
  readonly lane: string;
  readonly kind: LaneItem["kind"];
  readonly row: number;
  readonly lo: number;
  readonly hi: number;
  readonly chain: string | null;
  readonly channel: string | null;
  readonly label: string;
  readonly link: string | null;
  readonly family: SpurFamily | null;
  readonly order: number | null;
  readonly codes: readonly string[];
  readonly severity: Severity | null;
  #facts: (() => [string, string][]) | undefined;
  #cached: [string, string][] | null = null;
  constructor(p: ItemInput) {
    this.id = p.id;
    this.lane = p.lane;
    this.kind = p.kind;
    this.row = p.row;
    this.lo = p.lo;
    this.hi = p.hi;
    this.chain = p.chain ?? null;
    this.channel = p.channel ?? null;
    this.label = p.label;
    this.link = p.link ?? null;
    this.family = p.family ?? null;
    this.order = p.order ?? null;
    this.codes = p.codes ?? [];
    this.severity = p.severity ?? null;
    this.#facts = p.facts;
  }
  get facts(): readonly (readonly [string, string])[] {
    this.#cached ??= this.#facts ? this.#facts() : [];
    return this.#cached;
  }
}

/** A lane item with lazily formatted facts. */
export function item(p: ItemInput): LaneItem {
  return new Item(p);
}

/** `[a, b]` in increasing order. */
export const sorted = (a: number, b: number): GHzPair => (a <= b ? [a, b] : [b, a]);
