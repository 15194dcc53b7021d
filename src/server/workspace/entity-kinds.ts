import "server-only";
import type { z } from "zod";
import { chains, channels, detectors, lasers, resonators } from "@db/schema";
import { entityCreateSchemas, type entityUpdateSchemas, type EntityKind } from "@/schemas/workspace";
import {
  chainDto,
  chainInputOf,
  chainValues,
  channelDto,
  channelInputOf,
  channelValues,
  detectorDto,
  detectorInputOf,
  detectorValues,
  laserDto,
  laserInputOf,
  laserValues,
  resonatorDto,
  resonatorInputOf,
  resonatorValues,
} from "./mappers";

/**
 * The typed spec of each entity kind of a mission: its table, its create
 * schema and its row ↔ input ↔ API mappers (mappers.ts), plus the fields
 * that name rows of other kinds. Used by the entity service (entities.ts).
 */

/** The table of each kind. */
export interface Tables {
  lasers: typeof lasers;
  resonators: typeof resonators;
  detectors: typeof detectors;
  chains: typeof chains;
  channels: typeof channels;
}
/** Any of the five tables: drizzle types a table chosen at run time as this union. */
export type EntityTable = Tables[EntityKind];
export type EntityRow = EntityTable["$inferSelect"];
/** The columns a kind's mapper writes (everything but the mission and the position), one member per kind. */
type EntityValues = EntityTable["$inferInsert"] extends infer T
  ? T extends unknown
    ? Omit<T, "missionId" | "position">
    : never
  : never;

/** A stored row of kind K. */
export type Row<K extends EntityKind> = Tables[K]["$inferSelect"];
/** A complete, validated entity of kind K (the create schema's output). */
export type EntityInput<K extends EntityKind> = z.output<(typeof entityCreateSchemas)[K]>;
/** A validated update of kind K: any subset of the fields plus the version last read. */
export type EntityPatch<K extends EntityKind> = z.output<(typeof entityUpdateSchemas)[K]>;

export interface Spec<K extends EntityKind> {
  singular: string;
  table: Tables[K];
  /** The create schema: a complete entity (an update is merged with the stored row and re-parsed with it). */
  schema: z.ZodType<EntityInput<K>>;
  dto: (r: Row<K>) => { id: string; key: string; version: number };
  inputOf: (r: Row<K>) => EntityInput<K>;
  values: (i: EntityInput<K>) => EntityValues;
}

export const KINDS: { [K in EntityKind]: Spec<K> } = {
  lasers: {
    singular: "laser",
    table: lasers,
    schema: entityCreateSchemas.lasers,
    dto: laserDto,
    inputOf: laserInputOf,
    values: laserValues,
  },
  resonators: {
    singular: "resonator",
    table: resonators,
    schema: entityCreateSchemas.resonators,
    dto: resonatorDto,
    inputOf: resonatorInputOf,
    values: resonatorValues,
  },
  detectors: {
    singular: "detector",
    table: detectors,
    schema: entityCreateSchemas.detectors,
    dto: detectorDto,
    inputOf: detectorInputOf,
    values: detectorValues,
  },
  chains: {
    singular: "chain",
    table: chains,
    schema: entityCreateSchemas.chains,
    dto: chainDto,
    inputOf: chainInputOf,
    values: chainValues,
  },
  channels: {
    singular: "channel",
    table: channels,
    schema: entityCreateSchemas.channels,
    dto: channelDto,
    inputOf: channelInputOf,
    values: channelValues,
  },
};

/**
 * The rows of kind K's table. `spec.table` is `Tables[K]`, so its rows are
 * `Row<K>`; drizzle cannot follow a table chosen by a type parameter and
 * types them as the union of all five kinds, which this narrows back.
 */
export const rowsOf = <K extends EntityKind>(_spec: Spec<K>, rows: EntityRow[]) => rows as Row<K>[];

/** Fields of a chain or channel that name rows of other kinds (of the same mission). */
export const REFERENCES: { [K in EntityKind]: readonly (readonly [keyof EntityInput<K> & string, EntityKind])[] } = {
  lasers: [],
  resonators: [],
  detectors: [],
  chains: [
    ["laserId", "lasers"],
    ["resonatorId", "resonators"],
    ["detectorId", "detectors"],
  ],
  channels: [["chainId", "chains"]],
};

export function singularOf(kind: EntityKind): string {
  return KINDS[kind].singular;
}
