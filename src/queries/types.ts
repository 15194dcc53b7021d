/**
 * Shapes of the workspace JSON API as the client reads them (the agreed API:
 * entities mirror the `heterolane.plan/1` fields, plus id, key, version and
 * timestamps). Form input types come from the zod schemas in
 * `src/schemas/workspace.ts`; these describe what the server sends back.
 */

export type { Severity } from "@/lib/plan/types";

export interface Row {
  id: string;
  version: number;
  createdAt?: string;
  updatedAt?: string;
}

export interface MissionSummary {
  id: string;
  name: string;
  description: string | null;
  status: string;
  chainCount: number;
  channelCount: number;
  openErrors: number;
  openWarnings: number;
  updatedAt: string;
  version: number;
}

export interface Mission extends Row {
  name: string;
  description: string | null;
  status: string;
}

export interface Interval {
  minGHz: number;
  maxGHz: number;
}

export interface Laser extends Row {
  key: string;
  carrierTHz: number;
  carrierPowerMW: number;
  loPowerMW: number;
  reach: Interval[];
  stepMHz: number;
  driftMHz: number;
  lock: { modulationMHz: number; modulationIndex: number; orders: number };
}

export interface Resonator extends Row {
  key: string;
  fsrGHz: number;
  loadedQ: number;
}

export interface Detector extends Row {
  key: string;
  minGHz: number;
  maxGHz: number;
  maxInputMW: number;
  sampleRateGHz: number | null;
}

export interface Chain extends Row {
  key: string;
  laserId: string;
  resonatorId: string;
  detectorId: string;
  mode: number;
  sideband: "upper" | "lower";
  loOffsetGHz: number;
  rfInput: Interval;
  tapFraction: number;
  pathLossDB: number;
  carrierRejectionDB: number;
  sharedIf: boolean;
}

export interface Channel extends Row {
  key: string;
  name: string;
  chainId: string;
  centerGHz: number;
  bandwidthMHz: number;
  dsbOffsetGHz: number | null;
  integrationMs: number;
  antennaK: number;
  receiverK: number;
  gainStability: number;
  requiredNedtK: number | null;
}

export interface Settings {
  guardMHz: number;
  imageRejectionDB: number;
  spurMaxOrder: number;
  replicaLimitDB: number;
  version: number;
}

// The result document as the engine defines it (one place for its types).
export type { Finding, ChainResult, ChannelResult } from "@/lib/plan/types";
export type PlanResult = import("@/lib/plan/types").ResultDocument;

export interface RevisionSummary {
  number: number;
  status: string;
  authorName: string | null;
  createdAt: string;
  errorCount: number;
  warningCount: number;
  infoCount: number;
  summary: string | null;
}

export interface MutationRevision {
  revision?: { number: number; errorCount: number; warningCount: number };
}

export interface TuningPreview {
  intervals: Interval[];
  points: number;
  isolatedGHz?: number[];
  rejectedRows: { row: number; column?: string; message: string }[] | number;
}

export interface ChannelUploadPreview {
  rows: {
    row: number;
    channel?: Partial<Channel> & { chain?: string };
    errors: { column: string; message: string }[];
  }[];
  valid: boolean;
}

export interface DetectorResponsePreview {
  minGHz: number;
  maxGHz: number;
  peakDB: number;
}

export interface ActivityEntry {
  at: string;
  actorName: string | null;
  action: string;
  entity: string;
  summary: string | null;
  revision: number | null;
}
